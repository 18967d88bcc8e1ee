import type { EntityManager } from '@mikro-orm/postgresql';
import type { TrendPoint } from '@evenset/contracts';

/** A charted part with what the filters, the order and the subgroups go by. */
export interface TrendRow extends TrendPoint {
  lotId: string;
  inspectorId: string | null;
  masterId: string;
  grindDate: string;
  /** When the part's sold set was made (ms since the epoch), for subgroups in order of sale. */
  setCreatedAt: number | null;
}

/**
 * Each measured part of a part number with its current height: the newest result of its newest
 * inspection that no correction superseded (the rule of PartStatusService, here in one SQL pass so
 * that years of lots read in one query rather than as ORM objects). The height is the stored one
 * (to 0.1 nm, the precision of the length columns), which the index inspection_result_current_height
 * carries so that the results are read from the index alone. Rows come back in chart order: lots by
 * grind date, then inspection time.
 */
export const TREND_ROWS_SQL = `
  select cur.serial, l.id as "lotId", l.lot_number as "lotNumber", l.grind_date::text as "grindDate",
         cur.inspector_id as "inspectorId", cur.inspector_name as "inspectorName",
         to_char(cur.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as "inspectedAt",
         m.id as "masterId", m.code as "masterCode", cur.height::float8 as height,
         s.set_number as "setNumber", (extract(epoch from s.created_at) * 1000)::float8 as "setCreatedAt"
    from (
      select distinct on (c.part_id) c.part_id, p.serial, p.lot_id, c.created_at, c.inspector_id, c.inspector_name,
             c.run_id, x.height_mm as height
        from part p
        join inspection c on c.part_id = p.id
        join inspection_result x on x.inspection_id = c.id
       where p.part_number = ? and not exists (select 1 from inspection n where n.supersedes_id = c.id)
       order by c.part_id, c.created_at desc, c.id desc, x.created_at desc, x.id desc
    ) cur
    join lot l on l.id = cur.lot_id
    join bench_run b on b.id = cur.run_id
    join master_gauge m on m.id = b.master_id
    left join set_member sm on sm.part_id = cur.part_id
    left join matched_set s on s.id = sm.set_id and s.kind = 'set'`;

/** Compares like `localeCompare`, without building a collator per call (20,000 rows sort here). */
const { compare } = new Intl.Collator();
/** ISO dates and instants sort as plain strings; equal names (the parts of one lot) skip the collator. */
const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
const byName = (a: string, b: string) => (a === b ? 0 : compare(a, b));

/**
 * The rows straight from the driver (times already ISO text, numbers already numbers: 20,000 rows
 * make no objects beyond their own), sorted with the comparisons the other lists use.
 */
export async function trendRows(em: EntityManager, partNumber: string): Promise<TrendRow[]> {
  const rows = await em.getConnection().execute<TrendRow[]>(TREND_ROWS_SQL, [partNumber]);
  return rows.sort(
    (a, b) =>
      byText(a.grindDate, b.grindDate) ||
      byName(a.lotNumber, b.lotNumber) ||
      byText(a.inspectedAt, b.inspectedAt) ||
      byName(a.serial, b.serial),
  );
}
