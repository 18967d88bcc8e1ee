import { Check, DecimalType, Entity, Property, Unique } from '@mikro-orm/core';
import type { InstrumentKind } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';

/** An indicator, height gauge or probe used at the Bench; its status follows its calibration due date. */
@Entity({ tableName: 'instrument' })
@Check({
  name: 'instrument_values_check',
  expression: `kind in ('indicator', 'height-gauge', 'electronic-probe', 'other') and resolution_mm > 0`,
})
export class Instrument extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  code!: string;

  @Property({ type: 'text' })
  kind!: InstrumentKind;

  @Property({ type: 'text' })
  description!: string;

  @Property({ type: new DecimalType('number'), ...LENGTH_COLUMN })
  resolutionMm!: number;

  @Property({ type: 'date' })
  calibrationDueOn!: string;

  @Property({ type: 'timestamptz', nullable: true })
  retiredAt: Date | null = null;

  @Property({ type: 'text', nullable: true })
  retiredReason: string | null = null;

  @Property({ type: 'timestamptz', onUpdate: () => new Date(), defaultRaw: 'now()' })
  updatedAt: Date = new Date();
}
