import type { EntityManager } from '@mikro-orm/postgresql';
import type { DispositionKind, PartStatus, Verdict } from '@evenset/contracts';
import { driftFlagged } from '../inspections/bench-run.entity';
import type { ComputedResult } from '../inspections/inspection-result.entity';
import { statusOf } from './part-status';

/** A part of a lot with its status and the figures its list sorts on, read in one SQL pass. */
export interface LotPartFact {
  id: string;
  serial: string;
  status: PartStatus;
  /** The current result, whose full computed answer is read for the rows shown. */
  resultId: string | null;
  inspectedAt: Date | null;
  runFlagged: boolean;
  disposition: DispositionKind | null;
  height: number | null;
  flatness: number | null;
  parallelism: number | null;
  runout: number | null;
  expandedUncertainty: number | null;
}

/**
 * Per part of the lot: its current inspection (the newest no correction superseded), that
 * inspection's newest result and the newest disposition — the records PartStatusService reads as
 * entities, here as plain rows so that a lot of 10,000 parts pages in a fraction of a second. The
 * status itself is derived by the same `statusOf`.
 */
const LOT_PART_FACTS_SQL = `
  select p.id, p.serial, extract(epoch from cur.created_at) * 1000 as "inspectedAt",
         b.master_start_reading_mm as "runStart", b.master_end_reading_mm as "runEnd", b.drift_limit_mm as "driftLimit",
         res.id as "resultId", res.verdict, res.runout_mm as runout,
         (res.computed ->> 'height')::float8 as height,
         (res.computed -> 'flatness' ->> 'minimumZone')::float8 as flatness,
         (res.computed -> 'parallelism' ->> 'value')::float8 as parallelism,
         (res.computed ->> 'expandedUncertainty')::float8 as "expandedUncertainty",
         d.kind as disposition, extract(epoch from d.created_at) * 1000 as "decidedAt"
    from part p
    left join (
      select distinct on (c.part_id) c.id, c.part_id, c.run_id, c.created_at
        from inspection c join part q on q.id = c.part_id
       where q.lot_id = ? and not exists (select 1 from inspection n where n.supersedes_id = c.id)
       order by c.part_id, c.created_at desc, c.id desc
    ) cur on cur.part_id = p.id
    left join bench_run b on b.id = cur.run_id
    left join (
      select distinct on (x.inspection_id) x.id, x.inspection_id, x.verdict, x.runout_mm, x.computed
        from inspection_result x join inspection c on c.id = x.inspection_id join part q on q.id = c.part_id
       where q.lot_id = ?
       order by x.inspection_id, x.created_at desc, x.id desc
    ) res on res.inspection_id = cur.id
    left join (
      select distinct on (e.part_id) e.part_id, e.kind, e.created_at
        from part_disposition e join part q on q.id = e.part_id
       where q.lot_id = ?
       order by e.part_id, e.created_at desc, e.id desc
    ) d on d.part_id = p.id
   where p.lot_id = ?`;

type Numeric = string | number | null;
interface RawFact {
  id: string;
  serial: string;
  inspectedAt: Numeric;
  runStart: Numeric;
  runEnd: Numeric;
  driftLimit: Numeric;
  resultId: string | null;
  verdict: Verdict | null;
  runout: Numeric;
  height: number | null;
  flatness: number | null;
  parallelism: number | null;
  expandedUncertainty: number | null;
  disposition: DispositionKind | null;
  decidedAt: Numeric;
}

const num = (value: Numeric) => (value === null ? null : Number(value));
// Milliseconds, as the ORM's dates have them: statusOf compares a disposition's time with the inspection's.
const date = (value: Numeric) => (value === null ? null : new Date(Number(value)));

export async function lotPartFacts(em: EntityManager, lotId: string): Promise<LotPartFact[]> {
  const raw = await em.getConnection().execute<RawFact[]>(LOT_PART_FACTS_SQL, [lotId, lotId, lotId, lotId]);
  return raw.map((r) => {
    const inspectedAt = date(r.inspectedAt);
    const runFlagged = inspectedAt !== null && driftFlagged(Number(r.runStart), num(r.runEnd), Number(r.driftLimit));
    const decidedAt = date(r.decidedAt);
    const disposition = r.disposition && decidedAt ? { kind: r.disposition, createdAt: decidedAt } : null;
    return {
      id: r.id,
      serial: r.serial,
      status: statusOf({ inspectedAt, runFlagged, verdict: r.verdict, disposition }),
      resultId: r.resultId,
      inspectedAt,
      runFlagged,
      disposition: r.disposition,
      height: r.height,
      flatness: r.flatness,
      parallelism: r.parallelism,
      runout: num(r.runout),
      expandedUncertainty: r.expandedUncertainty,
    };
  });
}

/** The full computed answers of some results, by result id. */
export async function computedOf(em: EntityManager, resultIds: string[]): Promise<Map<string, ComputedResult>> {
  if (!resultIds.length) return new Map();
  const rows = await em
    .getConnection()
    .execute<{ id: string; computed: ComputedResult }[]>(
      `select id, computed from inspection_result where id in (${resultIds.map(() => '?').join(', ')})`,
      resultIds,
    );
  return new Map(rows.map((r) => [r.id, r.computed]));
}
