import { DecimalType, Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { BaseEntity } from '../database/base.entity';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { Part } from '../lots/part.entity';
import { MatchedSet } from './matched-set.entity';

/**
 * A part allocated to a set, with the result its height was taken from. A part belongs to one
 * set at most: the unique constraint is what lets exactly one of two simultaneous allocations win.
 */
@Entity({ tableName: 'set_member' })
@Unique({ properties: ['set', 'position'] })
export class SetMember extends BaseEntity {
  @ManyToOne(() => MatchedSet)
  set!: MatchedSet;

  @ManyToOne(() => Part, { eager: true })
  @Unique()
  part!: Part;

  /** 1-based place in the set, in ascending height. */
  @Property({ type: 'integer' })
  position!: number;

  @ManyToOne(() => InspectionResult)
  result!: InspectionResult;

  /** The height at allocation (the result's height), kept for the window of later parts. */
  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  heightMm!: number;
}
