import type { Trend, TrendPoints } from '@evenset/contracts';
import type { TrendData, TrendRow } from './trend-rows';

export type TrendChoices = Trend['choices'];

/** Where each lot, inspector and master stands in the choices. */
export interface Places {
  lot: Map<string, number>;
  inspector: Map<string, number>;
  master: Map<string, number>;
}

/** An inspector who has left keeps the name on the record, and no id. */
const inspectorKey = (row: TrendRow) => row.inspectorId ?? row.inspectorName;

/** Entries sorted by `compare` (or as they are), and the place of each key. */
function ordered<T>(entries: Map<string, T>, compare?: (a: T, b: T) => number) {
  const list = compare ? [...entries].sort(([, a], [, b]) => compare(a, b)) : [...entries];
  return { items: list.map(([, item]) => item), place: new Map(list.map(([key], i) => [key, i])) };
}

/**
 * Filter choices from all of the part number's data (lots in chart order, inspectors by name,
 * masters by code), and where each stands: points name them by that place.
 */
export function choicesOf({ rows, lots, masterCodes }: TrendData): { choices: TrendChoices; placeOf: Places } {
  const inspectors = new Map<string, { id: string | null; name: string }>();
  const masters = new Map<string, { id: string; code: string }>();
  for (const r of rows) {
    const inspector = inspectorKey(r);
    if (!inspectors.has(inspector)) inspectors.set(inspector, { id: r.inspectorId, name: r.inspectorName });
    if (!masters.has(r.masterId)) masters.set(r.masterId, { id: r.masterId, code: masterCodes.get(r.masterId)! });
  }
  const lot = ordered(new Map(lots.map((l) => [l.id, { id: l.id, lotNumber: l.lotNumber }])));
  const inspector = ordered(inspectors, (a, b) => a.name.localeCompare(b.name));
  const master = ordered(masters, (a, b) => a.code.localeCompare(b.code));
  return {
    choices: { lots: lot.items, inspectors: inspector.items, masters: master.items },
    placeOf: { lot: lot.place, inspector: inspector.place, master: master.place },
  };
}

/** The points as columns, naming lot, inspector and master by their place in the choices. */
export function pointsOf(rows: readonly TrendRow[], placeOf: Places): TrendPoints {
  // One `map` a column: each array is made at its full length at once (20,000 pushes cost more).
  return {
    serial: rows.map((r) => r.serial),
    lot: rows.map((r) => placeOf.lot.get(r.lotId)!),
    setNumber: rows.map((r) => r.setNumber),
    inspector: rows.map((r) => placeOf.inspector.get(inspectorKey(r))!),
    master: rows.map((r) => placeOf.master.get(r.masterId)!),
    inspectedAt: rows.map((r) => r.inspectedAt),
    height: rows.map((r) => r.height),
  };
}
