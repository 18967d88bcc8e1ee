import type { Inspection as InspectionView } from '@evenset/contracts';
import type { InspectionReading } from './inspection-reading.entity';
import type { ComputedResult } from './inspection-result.entity';
import type { Inspection } from './inspection.entity';
import type { PartRef } from './inspections.service';
import type { RunFacts } from './run-facts';

// An inspection as the API shows it, from its entities (a read) or from the rows a save has just
// stored (without reading them back): both must give the same view.

/** What an inspection's view shows besides its readings, results and correction. */
export type InspectionFacts = Omit<InspectionView, 'readings' | 'result' | 'results' | 'supersededById'>;

/** An inspection's facts from its entity, its part and run loaded. */
export function entityFacts(i: Inspection): InspectionFacts {
  return {
    id: i.id,
    partId: i.part.id,
    serial: i.part.serial,
    runId: i.run.id,
    specId: i.spec.id,
    masterCalibrationId: i.masterCalibration.id,
    instrumentId: i.instrumentId,
    instrumentResolution: i.instrumentResolutionMm,
    masterTemperature: i.masterTemperatureC,
    partTemperature: i.partTemperatureC,
    partExpansionPerK: i.partExpansionPerK,
    masterExpansionPerK: i.masterExpansionPerK,
    inspector: i.inspectorName,
    runFlagged: i.run.flagged(),
    supersedesId: i.supersedes?.id ?? null,
    reason: i.reason,
    createdAt: i.createdAt.toISOString(),
  };
}

// Rows as `insertAll` answers them: JSON numbers for numeric columns, Date for times.
export interface StoredInspection {
  id: string;
  spec_id: string;
  master_calibration_id: string;
  instrument_id: string;
  instrument_resolution_mm: number;
  master_temperature_c: number;
  part_temperature_c: number;
  part_expansion_per_k: number;
  master_expansion_per_k: number;
  inspector_name: string;
  supersedes_id: string | null;
  reason: string | null;
  created_at: Date;
}
export interface StoredReading {
  position: number;
  station: string;
  kind: InspectionReading['kind'];
  reading_mm: number;
}
export interface StoredResult {
  id: string;
  reason: string;
  master_calibration_id: string;
  computed: ComputedResult;
  created_at: Date;
}

/** The same facts from the row just stored, with the part and run it was stored for. */
export function storedFacts(row: StoredInspection, part: PartRef, run: RunFacts): InspectionFacts {
  return {
    id: row.id,
    partId: part.id,
    serial: part.serial,
    runId: run.id,
    specId: row.spec_id,
    masterCalibrationId: row.master_calibration_id,
    instrumentId: row.instrument_id,
    instrumentResolution: row.instrument_resolution_mm,
    masterTemperature: row.master_temperature_c,
    partTemperature: row.part_temperature_c,
    partExpansionPerK: row.part_expansion_per_k,
    masterExpansionPerK: row.master_expansion_per_k,
    inspector: row.inspector_name,
    runFlagged: run.flagged,
    supersedesId: row.supersedes_id,
    reason: row.reason,
    createdAt: row.created_at.toISOString(),
  };
}

/** One inspection's view: its facts, readings in plan order and results newest first. */
export function inspectionView(
  facts: InspectionFacts,
  readings: InspectionView['readings'],
  results: InspectionView['results'],
  supersededById: string | undefined,
): InspectionView {
  return { ...facts, supersededById: supersededById ?? null, readings, result: results[0]!, results };
}
