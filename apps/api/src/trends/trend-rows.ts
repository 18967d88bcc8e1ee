import type { EntityManager } from '@mikro-orm/postgresql';

/** A charted part with what the points, the filters and the subgroups go by. */
export interface TrendRow {
  serial: string;
  lotId: string;
  inspectorId: string | null;
  inspectorName: string;
  inspectedAt: string;
  masterId: string;
  /** mm */
  height: number;
  setNumber: string | null;
  /** When the part's sold set was made (ms since the epoch), for subgroups in order of sale. */
  setCreatedAt: number | null;
}

export interface TrendLot {
  id: string;
  lotNumber: string;
  grindDate: string;
}

/** A part number's charted parts, both in chart order, with the lots and masters they name. */
export interface TrendData {
  rows: TrendRow[];
  /** The lots holding charted parts. */
  lots: TrendLot[];
  /** Codes of the master gauges, by id. */
  masterCodes: Map<string, string>;
}

/**
 * Each measured part of a part number with its current height: the newest result of its newest
 * inspection that no correction superseded (the rule of PartStatusService). part_current holds
 * that result per part, kept by a trigger on every insert of results (migration
 * Migration20261202073000), so years of lots read as plain joins. The height is the stored one, to
 * 0.1 nm. Lots and masters are read apart (a few hundred rows), so that 20,000 rows do not each
 * repeat them; `trendData` puts the rows in chart order with the product's collation (sorting in SQL
 * cost more than the query itself at 20,000 parts).
 */
export const TREND_ROWS_SQL = `
  select p.serial, p.lot_id as "lotId", cur.inspector_id as "inspectorId", cur.inspector_name as "inspectorName",
         to_char(cur.inspected_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as "inspectedAt",
         b.master_id as "masterId", cur.height_mm::float8 as height,
         s.set_number as "setNumber", (extract(epoch from s.created_at) * 1000)::float8 as "setCreatedAt"
    from part p
    join part_current cur on cur.part_id = p.id
    join bench_run b on b.id = cur.run_id
    left join set_member sm on sm.part_id = p.id
    left join matched_set s on s.id = sm.set_id and s.kind = 'set'
   where p.part_number = ?`;

const LOTS_SQL = `
  select l.id, l.lot_number as "lotNumber", l.grind_date::text as "grindDate"
    from lot l join part_spec s on s.id = l.spec_id where s.part_number = ?`;

const MASTERS_SQL = `select id, code from master_gauge`;

/** Compares like `localeCompare`, without building a collator per call (20,000 rows sort here). */
const { compare } = new Intl.Collator();
/** ISO dates and instants sort as plain strings; equal names (the parts of one lot) skip the collator. */
const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
const byName = (a: string, b: string) => (a === b ? 0 : compare(a, b));

/**
 * The rows straight from the driver (times already ISO text, numbers already numbers: 20,000 rows
 * make no objects beyond their own) in chart order, with the comparisons the other lists use: lots
 * by grind date then lot number, and each lot's parts by inspection time then serial. Sorting the
 * few lots, then each lot's parts, costs a fraction of sorting every row by all four keys.
 */
export async function trendData(em: EntityManager, partNumber: string): Promise<TrendData> {
  const connection = em.getConnection();
  const [rows, lots, masters] = await Promise.all([
    connection.execute<TrendRow[]>(TREND_ROWS_SQL, [partNumber]),
    connection.execute<TrendLot[]>(LOTS_SQL, [partNumber]),
    connection.execute<{ id: string; code: string }[]>(MASTERS_SQL),
  ]);
  const rowsOf = new Map<string, TrendRow[]>();
  for (const row of rows) {
    const lot = rowsOf.get(row.lotId);
    if (lot) lot.push(row);
    else rowsOf.set(row.lotId, [row]);
  }
  const charted = lots
    .filter((lot) => rowsOf.has(lot.id))
    .sort((a, b) => byText(a.grindDate, b.grindDate) || byName(a.lotNumber, b.lotNumber));
  // A part takes its part number from its lot's spec, so every row's lot is among them.
  if (charted.length !== rowsOf.size) throw new Error(`A part of ${partNumber} lies in a lot of another part number.`);
  return {
    rows: charted.flatMap((lot) =>
      rowsOf.get(lot.id)!.sort((a, b) => byText(a.inspectedAt, b.inspectedAt) || byName(a.serial, b.serial)),
    ),
    lots: charted,
    masterCodes: new Map(masters.map((m) => [m.id, m.code])),
  };
}
