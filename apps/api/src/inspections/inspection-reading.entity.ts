import { Check, DecimalType, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import type { StationKind } from './measurement-plan';
import { Inspection } from './inspection.entity';

/** One raw indicator reading at one station, mm. Permanent. */
@Entity({ tableName: 'inspection_reading' })
@Check({ name: 'inspection_reading_kind_check', expression: `kind in ('top', 'datum', 'runout')` })
export class InspectionReading extends BaseEntity {
  @ManyToOne(() => Inspection)
  @Index()
  inspection!: Inspection;

  /** Order in the plan, so readings come back as they were taken. */
  @Property({ type: 'integer' })
  position!: number;

  @Property({ type: 'text' })
  station!: string;

  @Property({ type: 'text' })
  kind!: StationKind;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  readingMm!: number;
}
