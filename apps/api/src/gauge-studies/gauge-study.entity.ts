import { Check, Entity, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { Instrument } from '../instruments/instrument.entity';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { MasterGauge } from '../masters/master-gauge.entity';
import { Spec } from '../specs/spec.entity';

/**
 * A gauge R&R study as the engineer set it up: one spec revision (its band is the tolerance), one
 * instrument and one master (with the calibration in force at set-up), the number of trials and the
 * seed its schedule was shuffled with. Permanent: the schedule and the measurements are rows of
 * their own, and the study is complete when every slot has a measurement.
 */
@Entity({ tableName: 'gauge_study' })
@Check({ name: 'gauge_study_values_check', expression: 'trials between 2 and 5 and seed >= 0' })
export class GaugeStudy extends BaseEntity {
  @Property({ type: 'text' })
  name!: string;

  @ManyToOne(() => Spec, { eager: true })
  spec!: Spec;

  @ManyToOne(() => Instrument, { eager: true })
  instrument!: Instrument;

  @ManyToOne(() => MasterGauge, { eager: true })
  master!: MasterGauge;

  @ManyToOne(() => MasterCalibration, { eager: true })
  masterCalibration!: MasterCalibration;

  @Property({ type: 'integer' })
  trials!: number;

  @Property({ type: 'integer' })
  seed!: number;

  @Property({ type: 'uuid', nullable: true })
  createdById: string | null = null;

  @Property({ type: 'text' })
  createdByName!: string;
}
