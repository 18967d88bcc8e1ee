import type { MasterCalibration } from '../masters/master-calibration.entity';
import type { Spec } from '../specs/spec.entity';
import type { BenchRun } from './bench-run.entity';

/** What a result's computation reads of the master's calibration. */
export type CalibrationFacts = Pick<
  MasterCalibration,
  'id' | 'calibratedSizeMm' | 'expandedUncertaintyMm' | 'coverageFactor'
>;

/**
 * What recording reads of a run. Everything but two facts is fixed when the run starts (its
 * inspector, the lot and its released spec, the master's calibration, the instrument, the
 * temperatures and the master's start reading), so a save may take them from an earlier read of
 * the same run. The two that can change are read for every save: whether the run has ended, and
 * the master's expansion coefficient, which follows its material.
 */
export interface RunFacts {
  id: string;
  inspectorId: string | null;
  inspectorName: string;
  lotId: string;
  lotNumber: string;
  spec: Spec;
  calibration: CalibrationFacts;
  instrumentId: string;
  instrumentResolutionMm: number;
  masterTemperatureC: number;
  partTemperatureC: number;
  masterStartReadingMm: number;
  masterExpansionPerK: number;
  /** Only an ended run can be flagged, and only an open one takes inspections. */
  flagged: boolean;
}

export function runFactsOf(run: BenchRun): RunFacts {
  const calibration = run.masterCalibration;
  return {
    id: run.id,
    inspectorId: run.inspectorId,
    inspectorName: run.inspectorName,
    lotId: run.lot.id,
    lotNumber: run.lot.lotNumber,
    spec: run.lot.spec,
    calibration: {
      id: calibration.id,
      calibratedSizeMm: calibration.calibratedSizeMm,
      expandedUncertaintyMm: calibration.expandedUncertaintyMm,
      coverageFactor: calibration.coverageFactor,
    },
    instrumentId: run.instrument.id,
    instrumentResolutionMm: run.instrument.resolutionMm,
    masterTemperatureC: run.masterTemperatureC,
    partTemperatureC: run.partTemperatureC,
    masterStartReadingMm: run.masterStartReadingMm,
    masterExpansionPerK: run.master.material.expansionPerK,
    flagged: run.flagged(),
  };
}

/** The fixed facts of the runs saved to lately, a few hundred at most (one per inspector at work). */
export class RecentRuns {
  private readonly facts = new Map<string, RunFacts>();

  constructor(private readonly capacity = 500) {}

  get(id: string): RunFacts | undefined {
    return this.facts.get(id);
  }

  remember(facts: RunFacts): void {
    this.facts.delete(facts.id);
    this.facts.set(facts.id, facts);
    // A map iterates in insertion order: the first key is the run remembered longest ago.
    if (this.facts.size > this.capacity) this.facts.delete(this.facts.keys().next().value!);
  }
}
