import { Check, DecimalType, Entity, Property, Unique } from '@mikro-orm/core';
import type { Material as MaterialView, MaterialConfidence } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';

/** A shop material and its expansion coefficient, with where the number comes from. */
@Entity({ tableName: 'material' })
@Check({ name: 'material_confidence_check', expression: `confidence in ('firm', 'from memory')` })
export class Material extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  name!: string;

  /** 1e-6/K; two decimals are more than any handbook value carries. */
  @Property({ type: new DecimalType('number'), precision: 6, scale: 2 })
  expansionPerK!: number;

  @Property({ type: 'text' })
  source!: string;

  @Property({ type: 'text' })
  confidence!: MaterialConfidence;

  @Property({ type: 'timestamptz', onUpdate: () => new Date(), defaultRaw: 'now()' })
  updatedAt: Date = new Date();

  toView(): MaterialView {
    return {
      id: this.id,
      name: this.name,
      expansionPerK: this.expansionPerK,
      source: this.source,
      confidence: this.confidence,
    };
  }
}
