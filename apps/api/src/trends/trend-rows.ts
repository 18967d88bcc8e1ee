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
 * that years of lots read in one query rather than as ORM objects). The height is the computed,
 * unrounded one the part page shows. Rows come back in chart order: lots by grind date, then
 * inspection time.
 */
export const TREND_ROWS_SQL = `
  select cur.serial, l.id as "lotId", l.lot_number as "lotNumber", l.grind_date::text as "grindDate",
         cur.inspector_id as "inspectorId", cur.inspector_name as "inspectorName",
         extract(epoch from cur.created_at) * 1000 as "inspectedAt",
         m.id as "masterId", m.code as "masterCode", cur.height,
         s.set_number as "setNumber", extract(epoch from s.created_at) * 1000 as "setCreatedAt"
    from (
      select distinct on (c.part_id) c.part_id, p.serial, p.lot_id, c.created_at, c.inspector_id, c.inspector_name,
             c.run_id, (x.computed ->> 'height')::float8 as height
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

interface RawRow extends Omit<TrendRow, 'inspectedAt' | 'setCreatedAt'> {
  inspectedAt: string | number;
  setCreatedAt: string | number | null;
}

/** Compares like `localeCompare`, without building a collator per call (20,000 rows sort here). */
const { compare } = new Intl.Collator();

export async function trendRows(em: EntityManager, partNumber: string): Promise<TrendRow[]> {
  const rows = await em.getConnection().execute<RawRow[]>(TREND_ROWS_SQL, [partNumber]);
  for (const row of rows) {
    row.height = Number(row.height);
    row.inspectedAt = new Date(Number(row.inspectedAt)).toISOString();
    if (row.setCreatedAt !== null) row.setCreatedAt = Number(row.setCreatedAt);
  }
  // Sorted here, with the comparisons the other lists use (SQL collations differ from them).
  return (rows as TrendRow[]).sort(
    (a, b) =>
      compare(a.grindDate, b.grindDate) ||
      compare(a.lotNumber, b.lotNumber) ||
      compare(a.inspectedAt, b.inspectedAt) ||
      compare(a.serial, b.serial),
  );
}
