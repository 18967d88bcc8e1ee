import { Check, DecimalType, Entity, Index, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { CustomerOrder } from '../customers/customer-order.entity';
import { BaseEntity } from '../database/base.entity';

export type MatchedSetKind = 'set' | 'replacement';

/**
 * Parts allocated together to a customer's order: a matched set, or a replacement part sent to
 * match a set sold earlier. Permanent: the database refuses UPDATE and DELETE.
 */
@Entity({ tableName: 'matched_set' })
@Check({
  name: 'matched_set_kind_check',
  expression: `kind in ('set', 'replacement') and ((kind = 'replacement') = (replaces_set_id is not null)) and matching_band_mm > 0`,
})
@Index({ properties: ['partNumber', 'kind'] })
export class MatchedSet extends BaseEntity {
  /** Human reference printed on the certificate, e.g. S-2026-0007. */
  @Property({ type: 'text' })
  @Unique()
  setNumber!: string;

  @ManyToOne(() => CustomerOrder, { eager: true })
  @Index()
  order!: CustomerOrder;

  @Property({ type: 'text' })
  partNumber!: string;

  @Property({ type: 'text' })
  kind!: MatchedSetKind;

  /** For a replacement: the set it was chosen to match. */
  @ManyToOne(() => MatchedSet, { nullable: true })
  replacesSet: MatchedSet | null = null;

  /** The matching band of the spec revision at allocation. */
  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  matchingBandMm!: number;

  @Property({ type: 'uuid', nullable: true })
  allocatedById: string | null = null;

  @Property({ type: 'text' })
  allocatedByName!: string;
}
