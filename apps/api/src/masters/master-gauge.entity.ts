import { DecimalType, Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { Material } from '../materials/material.entity';
import { MasterCalibration } from './master-calibration.entity';

/** A calibrated master the inspectors zero on. Its calibrations are permanent records of their own. */
@Entity({ tableName: 'master_gauge' })
export class MasterGauge extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  code!: string;

  @Property({ type: 'text' })
  description!: string;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  nominalMm!: number;

  @ManyToOne(() => Material, { eager: true })
  material!: Material;

  /** The calibration in force (latest not superseded), kept here so lists can filter on its due date. */
  @ManyToOne(() => MasterCalibration, { nullable: true, eager: true })
  currentCalibration: MasterCalibration | null = null;

  @Property({ type: 'timestamptz', nullable: true })
  retiredAt: Date | null = null;

  @Property({ type: 'text', nullable: true })
  retiredReason: string | null = null;

  @Property({ type: 'timestamptz', onUpdate: () => new Date(), defaultRaw: 'now()' })
  updatedAt: Date = new Date();
}
