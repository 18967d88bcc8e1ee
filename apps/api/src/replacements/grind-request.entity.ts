import { DecimalType, Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import type { GrindPass } from '@evenset/metrology';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { BaseEntity } from '../database/base.entity';
import { Part } from '../lots/part.entity';
import { MatchedSet } from '../sets/matched-set.entity';

const length = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN });

/**
 * A shop-floor request to grind a part down to a target height so that it can replace a part of
 * a set sold earlier. Its figures are frozen at issue; its progress is a list of `GrindRequestStep`s.
 */
@Entity({ tableName: 'grind_request' })
export class GrindRequest extends BaseEntity {
  /** e.g. GR-2026-0003. */
  @Property({ type: 'text' })
  @Unique()
  requestNumber!: string;

  @ManyToOne(() => Part, { eager: true })
  part!: Part;

  /** The sold set the ground part must match. */
  @ManyToOne(() => MatchedSet)
  originalSet!: MatchedSet;

  @Property(length())
  currentHeightMm!: number;

  @Property(length())
  targetHeightMm!: number;

  @Property(length())
  stockMm!: number;

  /** The replacement window the part must end in. */
  @Property(length())
  windowLowMm!: number;

  @Property(length())
  windowHighMm!: number;

  /** The pass plan (mm) from the spec's grinding parameters, as computed at issue. */
  @Property({ type: 'jsonb' })
  passes!: GrindPass[];

  @Property({ type: 'uuid', nullable: true })
  requestedById: string | null = null;

  @Property({ type: 'text' })
  requestedByName!: string;
}
