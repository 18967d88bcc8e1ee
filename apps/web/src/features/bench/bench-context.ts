import type { LotDetail, MasterDetail, Run, Spec } from '@evenset/contracts';
import { fromMillimetres, type LengthUnit } from '@evenset/metrology';
import { benchStations, type BenchStation } from './bench-stations';
import type { LiveInput } from './live-result';
import type { ReadingGuard } from './components/reading-entry';

/** Everything the Bench knows once a run has started. Lengths in mm unless said otherwise. */
export interface BenchContext {
  run: Run;
  lot: LotDetail;
  spec: Spec;
  master: MasterDetail;
  stations: BenchStation[];
  live: LiveInput;
}

export function benchContext(run: Run, lot: LotDetail, spec: Spec, master: MasterDetail): BenchContext {
  const calibration = master.current;
  if (!calibration) throw new Error(`Master ${master.code} has no calibration in force.`);
  return {
    run,
    lot,
    spec,
    master,
    stations: benchStations(spec.definition.plan),
    live: {
      spec,
      masterSize: calibration.calibratedSize,
      masterExpandedUncertainty: calibration.expandedUncertainty,
      masterCoverageFactor: calibration.coverageFactor,
      masterExpansionPerK: master.material.expansionPerK,
      masterReading: run.masterStartReading,
      resolution: run.instrument.resolution,
      partTemperature: run.partTemperature,
      masterTemperature: run.masterTemperature,
    },
  };
}

/**
 * What the typo guard expects, in `unit`: a top-face reading sits where the middle of the band is
 * above the master (zero + middle of band − master size); other stations near those already read.
 */
export function readingGuard(context: BenchContext, unit: LengthUnit): ReadingGuard {
  const { band, nominal } = context.spec.definition;
  const offset = nominal + (band.lower + band.upper) / 2 - context.live.masterSize;
  const topExpected = fromMillimetres(context.run.masterStartReading + offset, unit);
  return {
    bandWidth: fromMillimetres(band.upper - band.lower, unit),
    expected: (station, taken) => {
      if (station.kind === 'top') return topExpected;
      const same = context.stations
        .slice(0, taken.length)
        .flatMap((s, i) => (s.kind === station.kind ? [taken[i] ?? 0] : []));
      return same.length ? same.reduce((a, b) => a + b, 0) / same.length : topExpected;
    },
  };
}
