import { Check, DecimalType, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import type { DispositionKind, Disposition as DispositionView } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { Part } from './part.entity';

const optionalLength = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN, nullable: true });

/**
 * A disposition (rework, scrap, use as is) or a release of a part. Append-only: a later decision
 * is a new record, and the part's status follows the newest.
 */
@Entity({ tableName: 'part_disposition' })
@Check({
  name: 'part_disposition_kind_check',
  expression: `kind in ('rework', 'scrap', 'use-as-is', 'release') and (kind not in ('scrap', 'use-as-is') or reason is not null) and ((kind = 'rework') = (target_height_mm is not null))`,
})
@Index({ properties: ['part', 'createdAt'] })
export class PartDisposition extends BaseEntity {
  @ManyToOne(() => Part)
  part!: Part;

  @Property({ type: 'text' })
  kind!: DispositionKind;

  @Property({ type: 'text', nullable: true })
  reason: string | null = null;

  /** The inspection the decision was made on. */
  @Property({ type: 'uuid', nullable: true })
  inspectionId: string | null = null;

  @Property(optionalLength())
  currentHeightMm: number | null = null;

  @Property(optionalLength())
  targetHeightMm: number | null = null;

  @Property(optionalLength())
  stockMm: number | null = null;

  /** The pass plan (mm) as computed at the time; null when the spec has no grinding parameters. */
  @Property({ type: 'jsonb', nullable: true })
  passes: NonNullable<DispositionView['rework']>['passes'] = null;

  @Property({ type: 'uuid', nullable: true })
  decidedById: string | null = null;

  @Property({ type: 'text' })
  decidedByName!: string;
}
