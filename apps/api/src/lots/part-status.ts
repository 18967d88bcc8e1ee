import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type { DispositionKind, PartRow, PartStatus, Verdict } from '@evenset/contracts';
import type { ComputedResult, InspectionResult } from '../inspections/inspection-result.entity';
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
      return { part, inspection, result, disposition, status: statusOf(factsOf(inspection, result, disposition)) };
    });
  }
}

/** What a part's status derives from, whether read as entities or straight from SQL. */
export interface StatusFacts {
  /** The current inspection's time. */
  inspectedAt: Date | null;
  runFlagged: boolean;
  verdict: Verdict | null;
  disposition: { kind: DispositionKind; createdAt: Date } | null;
}

function factsOf(
  inspection: Inspection | null,
  result: InspectionResult | null,
  disposition: PartDisposition | null,
): StatusFacts {
  return {
    inspectedAt: inspection?.createdAt ?? null,
    runFlagged: inspection?.run.flagged() ?? false,
    verdict: result?.verdict ?? null,
    disposition,
  };
}

export function statusOf({ inspectedAt, runFlagged, verdict, disposition }: StatusFacts): PartStatus {
  if (disposition && (!inspectedAt || disposition.createdAt >= inspectedAt))
    return disposition.kind === 'release' ? 'released' : disposition.kind;
  if (!inspectedAt || !verdict) return 'not-inspected';
  if (runFlagged) return 'held';
  return verdict;
}

/** What a row of a lot's part list shows, from entities or straight from SQL. */
export interface PartRowFacts {
  id: string;
  serial: string;
  status: PartStatus;
  computed: ComputedResult | null;
  runoutMm: number | null;
  runFlagged: boolean;
  inspectedAt: Date | null;
  disposition: DispositionKind | null;
}

export function rowFactsOf({ part, inspection, result, disposition, status }: PartState): PartRowFacts {
  return {
    id: part.id,
    serial: part.serial,
    status,
    computed: result?.computed ?? null,
    runoutMm: result?.runoutMm ?? null,
    runFlagged: inspection?.run.flagged() ?? false,
    inspectedAt: inspection?.createdAt ?? null,
    disposition: disposition?.kind ?? null,
  };
}

/** A row of a lot's part list; `outsideWindow` tells whether a height would not match sets sold before. */
export function partRow(facts: PartRowFacts, outsideWindow: (height: number | null) => boolean | null): PartRow {
  const { computed } = facts;
  return {
    id: facts.id,
    serial: facts.serial,
    status: facts.status,
    height: computed?.height ?? null,
    flatness: computed?.flatness?.minimumZone ?? null,
    parallelism: computed?.parallelism?.value ?? null,
    runout: facts.runoutMm,
    totalRunout: computed?.runout?.total ?? null,
    expandedUncertainty: computed?.expandedUncertainty ?? null,
    verdict: computed?.verdict ?? null,
    verdicts: {
      height: computed?.decisions.height.verdict ?? null,
      flatness: computed?.decisions.flatness?.verdict ?? null,
      parallelism: computed?.decisions.parallelism?.verdict ?? null,
      runout: computed?.decisions.runout?.verdict ?? null,
    },
    runFlagged: facts.runFlagged,
    inspectedAt: facts.inspectedAt?.toISOString() ?? null,
    disposition: facts.disposition,
    outsideWindow: outsideWindow(computed?.height ?? null),
  };
}
