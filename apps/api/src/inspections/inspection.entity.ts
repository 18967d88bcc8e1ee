import { Check, DecimalType, Entity, Index, ManyToOne, OneToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { Part } from '../lots/part.entity';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { Spec } from '../specs/spec.entity';
import { BenchRun } from './bench-run.entity';

const celsius = () => ({ type: new DecimalType('number'), precision: 5, scale: 2 });
const perK = () => ({ type: new DecimalType('number'), precision: 6, scale: 2 });

/**
 * One part measured in one run: every input of its computation, kept as they were. Permanent:
 * the database refuses UPDATE and DELETE; a correction is a new inspection superseding this one.
 */
@Entity({ tableName: 'inspection' })
@Check({ name: 'inspection_correction_check', expression: '(supersedes_id is null) = (reason is null)' })
@Index({ properties: ['part', 'createdAt'] })
export class Inspection extends BaseEntity {
  @ManyToOne(() => Part)
  part!: Part;

  @ManyToOne(() => BenchRun)
  @Index()
  run!: BenchRun;

  @ManyToOne(() => Spec)
  spec!: Spec;

  /** The master calibration in force at the time of the inspection. */
  @ManyToOne(() => MasterCalibration)
  masterCalibration!: MasterCalibration;

  @Property({ type: 'uuid' })
  instrumentId!: string;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  instrumentResolutionMm!: number;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  masterReadingMm!: number;

  @Property(celsius())
  masterTemperatureC!: number;

  @Property(celsius())
  partTemperatureC!: number;

  /** 1e-6/K: the spec's frozen coefficient and the master's material, as used. */
  @Property(perK())
  partExpansionPerK!: number;

  @Property(perK())
  masterExpansionPerK!: number;

  @Property({ type: 'uuid', nullable: true })
  inspectorId: string | null = null;

  @Property({ type: 'text' })
  inspectorName!: string;

  /** The inspection this one corrects; at most one correction per inspection. */
  @OneToOne(() => Inspection, { owner: true, nullable: true })
  supersedes: Inspection | null = null;

  @Property({ type: 'text', nullable: true })
  reason: string | null = null;
}
