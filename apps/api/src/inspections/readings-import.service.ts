import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { ReadingsImport, ReadingsPreview, RowError, SessionUser } from '@evenset/contracts';
import type { BenchRun } from './bench-run.entity';
import { CsvRefusedException } from './inspections.exception';
import { InspectionsService, type PartReadings, type PartRef } from './inspections.service';
import { matchReadings, planStations } from './measurement-plan';
import { parseReadingsCsv } from './readings-csv';
import { runFactsOf } from './run-facts';

interface Mapped {
  preview: ReadingsPreview;
  parts: PartReadings[];
}

/** Readings of a run uploaded as a CSV file (docs/csv-format.md): preview, then import all or nothing. */
@Injectable()
export class ReadingsImportService {
  constructor(
    private readonly em: EntityManager,
    private readonly inspections: InspectionsService,
  ) {}

  async preview(runId: string, content: Buffer): Promise<ReadingsPreview> {
    return (await this.map(await this.inspections.openRun(runId), content)).preview;
  }

  async import(actor: SessionUser, runId: string, content: Buffer): Promise<ReadingsImport> {
    const run = await this.inspections.openRun(runId);
    const { preview, parts } = await this.map(run, content);
    if (preview.errors.length) throw new CsvRefusedException(preview.errors);
    const recorded = (await this.inspections.record(actor, runFactsOf(run), parts)).parts;
    return {
      inspections: recorded.length,
      readings: parts.reduce((n, p) => n + p.values.length, 0),
      parts: recorded.map((i) => ({
        partId: i.part.id,
        serial: i.part.serial,
        inspectionId: i.id,
        verdict: i.verdict,
      })),
    };
  }

  /** Maps rows to the lot's parts and the plan's stations; every problem becomes a row error. */
  private async map(run: BenchRun, content: Buffer): Promise<Mapped> {
    const parsed = parseReadingsCsv(content);
    const errors: RowError[] = [...parsed.errors];
    const stations = planStations(run.lot.spec.plan);
    const stationNames = new Set(stations.map((s) => s.name));
    // Plain rows, not entities: thousands of parts need not enter the unit of work.
    const lotParts = new Map(
      (
        await this.em.getConnection().execute<PartRef[]>('select id, serial from part where lot_id = ?', [run.lot.id])
      ).map((p) => [p.serial, p]),
    );
    const bySerial = new Map<string, { part: PartRef; rows: typeof parsed.readings }>();
    const seen = new Map<string, number>();
    for (const reading of parsed.readings) {
      const part = lotParts.get(reading.serial);
      if (!part) {
        errors.push({
          row: reading.row,
          column: 'serial',
          value: reading.serial,
          message: `There is no part ${reading.serial} in lot ${run.lot.lotNumber}.`,
        });
        continue;
      }
      if (!stationNames.has(reading.station)) {
        errors.push({
          row: reading.row,
          column: 'station',
          value: reading.station,
          message: `There is no station "${reading.station}" in the plan of ${run.lot.spec.partNumber} rev ${run.lot.spec.revision}.`,
        });
        continue;
      }
      const key = `${reading.serial}\u0000${reading.station}`;
      const first = seen.get(key);
      if (first !== undefined) {
        errors.push({
          row: reading.row,
          column: 'station',
          value: reading.station,
          message: `Part ${reading.serial} already has a reading at station ${reading.station} (row ${first}).`,
        });
        continue;
      }
      seen.set(key, reading.row);
      const entry = bySerial.get(reading.serial) ?? { part, rows: [] };
      entry.rows.push(reading);
      bySerial.set(reading.serial, entry);
    }

    const parts: PartReadings[] = [];
    const previewParts: ReadingsPreview['parts'] = [];
    for (const [serial, { part, rows }] of bySerial) {
      const { values } = matchReadings(
        stations,
        rows.map((r) => ({ station: r.station, reading: r.readingMm })),
      );
      const present = new Set(rows.map((r) => r.station));
      const missingStations = stations.filter((s) => !present.has(s.name)).map((s) => s.name);
      if (missingStations.length)
        errors.push({
          row: rows[0]!.row,
          column: 'station',
          value: null,
          message: `Part ${serial} has no reading at station${missingStations.length > 1 ? 's' : ''} ${missingStations.join(', ')}; every station of the plan is needed.`,
        });
      else parts.push({ part, values });
      previewParts.push({
        partId: part.id,
        serial,
        readings: rows.map((r) => ({ row: r.row, station: r.station, reading: r.readingMm })),
        missingStations,
      });
    }
    errors.sort((a, b) => a.row - b.row);
    return { preview: { rows: parsed.rows, parts: previewParts, errors }, parts };
  }
}
