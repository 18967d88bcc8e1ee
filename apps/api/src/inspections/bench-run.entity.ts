import { Check, DecimalType, Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { LENGTH_COLUMN } from '../common/units/lengths';
import { Instrument } from '../instruments/instrument.entity';
import { Lot } from '../lots/lot.entity';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { MasterGauge } from '../masters/master-gauge.entity';

const length = () => ({ type: new DecimalType('number'), ...LENGTH_COLUMN });
const celsius = () => ({ type: new DecimalType('number'), precision: 5, scale: 2 });

/**
 * One inspector's session at the plate: one lot, one master (zeroed at the start), one
 * instrument. The end check is written once; the drift between the checks flags the run.
 */
@Entity({ tableName: 'bench_run' })
@Check({
  name: 'bench_run_values_check',
  expression:
    'master_temperature_c between 0 and 50 and part_temperature_c between 0 and 50 and drift_limit_mm > 0 and (ended_at is null) = (master_end_reading_mm is null)',
})
export class BenchRun extends BaseEntity {
  @ManyToOne(() => Lot, { eager: true })
  @Index()
  lot!: Lot;

  @ManyToOne(() => MasterGauge, { eager: true })
  master!: MasterGauge;

  /** The calibration in force when the run started. */
  @ManyToOne(() => MasterCalibration, { eager: true })
  masterCalibration!: MasterCalibration;

  @ManyToOne(() => Instrument, { eager: true })
  instrument!: Instrument;

  @Property({ type: 'uuid', nullable: true })
  inspectorId: string | null = null;

  @Property({ type: 'text' })
  inspectorName!: string;

  @Property(celsius())
  masterTemperatureC!: number;

  @Property(celsius())
  partTemperatureC!: number;

  @Property(length())
  masterStartReadingMm!: number;

  @Property({ ...length(), nullable: true })
  masterEndReadingMm: number | null = null;

  /** The drift limit that applied (the spec's own or the default), mm. */
  @Property(length())
  driftLimitMm!: number;

  @Property({ type: 'timestamptz', nullable: true })
  endedAt: Date | null = null;

  drift(): number | null {
    return this.masterEndReadingMm == null ? null : this.masterEndReadingMm - this.masterStartReadingMm;
  }

  flagged(): boolean {
    return driftFlagged(this.masterStartReadingMm, this.masterEndReadingMm, this.driftLimitMm);
  }
}

/**
 * Drift of the master beyond the run's limit, compared after rounding away binary noise of the
 * difference; a run not yet checked at its end is not flagged.
 */
export function driftFlagged(startMm: number, endMm: number | null, limitMm: number): boolean {
  return endMm != null && Math.abs(endMm - startMm) - limitMm > 1e-9;
}
