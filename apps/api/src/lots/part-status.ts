import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { PartRow, PartStatus } from '@evenset/contracts';
import type { InspectionResult } from '../inspections/inspection-result.entity';
import { Inspection } from '../inspections/inspection.entity';
import { InspectionsService } from '../inspections/inspections.service';
import { PartDisposition } from './part-disposition.entity';
import type { Part } from './part.entity';

/** Where a part stands and the records it stands on. */
export interface PartState {
  part: Part;
  /** The newest inspection that no correction superseded. */
  inspection: Inspection | null;
  result: InspectionResult | null;
  disposition: PartDisposition | null;
  status: PartStatus;
}

/**
 * Derives part status from the records (never stored): the newest disposition or release when it
 * came after the current inspection, otherwise the current inspection's verdict — `held` when its
 * run drifted beyond the limit — or `not-inspected`.
 */
@Injectable()
export class PartStatusService {
  constructor(
    private readonly em: EntityManager,
    private readonly inspections: InspectionsService,
  ) {}

  async states(parts: Part[]): Promise<PartState[]> {
    if (!parts.length) return [];
    const all = await this.em.find(
      Inspection,
      { part: { $in: parts } },
      { populate: ['run'], orderBy: { createdAt: 'asc', id: 'asc' } },
    );
    const superseded = new Set(all.flatMap((i) => (i.supersedes ? [i.supersedes.id] : [])));
    const current = new Map<string, Inspection>();
    for (const i of all) if (!superseded.has(i.id)) current.set(i.part.id, i);
    const results = await this.inspections.latestResults([...current.values()].map((i) => i.id));
    const dispositions = new Map<string, PartDisposition>();
    for (const d of await this.em.find(
      PartDisposition,
      { part: { $in: parts } },
      { orderBy: { createdAt: 'asc', id: 'asc' } },
    ))
      dispositions.set(d.part.id, d);

    return parts.map((part) => {
      const inspection = current.get(part.id) ?? null;
      const result = inspection ? (results.get(inspection.id) ?? null) : null;
      const disposition = dispositions.get(part.id) ?? null;
      return { part, inspection, result, disposition, status: statusOf(inspection, result, disposition) };
    });
  }
}

function statusOf(
  inspection: Inspection | null,
  result: InspectionResult | null,
  disposition: PartDisposition | null,
): PartStatus {
  if (disposition && (!inspection || disposition.createdAt >= inspection.createdAt))
    return disposition.kind === 'release' ? 'released' : disposition.kind;
  if (!inspection || !result) return 'not-inspected';
  if (inspection.run.flagged()) return 'held';
  return result.verdict;
}

/** A row of a lot's part list; `outsideWindow` tells whether a height would not match sets sold before. */
export function partRow(state: PartState, outsideWindow: (height: number | null) => boolean | null): PartRow {
  const { part, inspection, result, disposition } = state;
  const computed = result?.computed;
  return {
    id: part.id,
    serial: part.serial,
    status: state.status,
    height: computed?.height ?? null,
    flatness: computed?.flatness?.minimumZone ?? null,
    parallelism: computed?.parallelism?.value ?? null,
    runout: result?.runoutMm ?? null,
    totalRunout: computed?.runout?.total ?? null,
    expandedUncertainty: computed?.expandedUncertainty ?? null,
    verdict: computed?.verdict ?? null,
    verdicts: {
      height: computed?.decisions.height.verdict ?? null,
      flatness: computed?.decisions.flatness?.verdict ?? null,
      parallelism: computed?.decisions.parallelism?.verdict ?? null,
      runout: computed?.decisions.runout?.verdict ?? null,
    },
    runFlagged: inspection?.run.flagged() ?? false,
    inspectedAt: inspection?.createdAt.toISOString() ?? null,
    disposition: disposition?.kind ?? null,
    outsideWindow: outsideWindow(computed?.height ?? null),
  };
}
