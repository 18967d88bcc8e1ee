import { Check, DecimalType, Entity, Index, ManyToOne, OneToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { GaugeStudySlot } from './gauge-study-slot.entity';

const length = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN });

/**
 * One reading of a study part against the study's master, and the height it gives (the master's
 * calibrated size + the reading). Permanent: a typing slip is corrected by a new record that
 * supersedes this one, with a reason.
 */
@Entity({ tableName: 'gauge_study_measurement' })
@Check({ name: 'gauge_study_measurement_correction_check', expression: '(supersedes_id is null) = (reason is null)' })
export class GaugeStudyMeasurement extends BaseEntity {
  @ManyToOne(() => GaugeStudySlot, { eager: true })
  @Index()
  slot!: GaugeStudySlot;

  @Property(length())
  readingMm!: number;

  @Property(length())
  heightMm!: number;

  @Property({ type: 'uuid', nullable: true })
  recordedById: string | null = null;

  @Property({ type: 'text' })
  recordedByName!: string;

  /** The measurement this one corrects; at most one correction per measurement. */
  @OneToOne(() => GaugeStudyMeasurement, { owner: true, nullable: true })
  supersedes: GaugeStudyMeasurement | null = null;

  @Property({ type: 'text', nullable: true })
  reason: string | null = null;
}
