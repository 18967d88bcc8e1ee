import { EntityManager } from '@mikro-orm/postgresql';
import { ensureLot } from '../src/database/factories/lot.factory';
import { ensureSpec } from '../src/database/factories/spec.factory';
import { RB40_REV_B } from '../src/database/seeders/demo-specs';
import { TREND_ROWS_SQL } from '../src/trends/trend-rows';
import { type Bench, givenBench, partRows, post, startRun, topReadings } from './setup/bench';
import { startTestApp, type TestApp } from './setup/test-app';

/*
 * The trend query is the heaviest read of the product (every part of a part number, years of lots):
 * docs/performance.md measures it at 20,000 parts. This test checks its plan (PostgreSQL's EXPLAIN)
 * on 4,000 parts, so that a lost index or a per-part scan shows up here rather than in production.
 */

const COPIES = 4_000;

interface PlanNode {
  'Node Type': string;
  'Relation Name'?: string;
  'Index Name'?: string;
  'Actual Loops': number;
  'Actual Rows': number;
  Plans?: PlanNode[];
}

const nodesOf = (node: PlanNode): PlanNode[] => [node, ...(node.Plans ?? []).flatMap(nodesOf)];

describe('the trend query plan', () => {
  let t: TestApp;
  let bench: Bench;
  let em: EntityManager;

  const plan = async (partNumber: string): Promise<PlanNode[]> => {
    const [row] = await em
      .getConnection()
      .execute<{ 'QUERY PLAN': [{ Plan: PlanNode }] }[]>(`explain (analyze, format json) ${TREND_ROWS_SQL}`, [
        partNumber,
      ]);
    return nodesOf(row!['QUERY PLAN'][0].Plan);
  };
  const scans = (nodes: PlanNode[], table: string) => nodes.filter((n) => n['Relation Name'] === table);

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    em = bench.em.fork();

    // A second part number with three measured parts: the one a selective read must find by index.
    const spec = await ensureSpec(em, {
      partNumber: 'QP-7',
      revision: 'A',
      status: 'released',
      material: bench.steel,
      definition: RB40_REV_B,
    });
    const lot = await ensureLot(em, {
      lotNumber: 'L-QP-7',
      spec,
      grindDate: '2026-11-20',
      serials: ['Q1', 'Q2', 'Q3'],
    });
    const run = await startRun(bench, lot.id);
    for (const part of (await partRows(bench, lot.id)).items)
      await post(bench.inspector, `/api/runs/${run.id}/inspections`, {
        partId: part.id,
        unit: 'in',
        readings: topReadings([-0.0002]),
      }).expect(201);

    // 4,000 RB-40 parts in 100 lots, each a copy of one measured part (inspection and result).
    const rb = await ensureLot(em, {
      lotNumber: 'L-QP-RB',
      spec: bench.spec,
      grindDate: '2026-11-19',
      serials: ['R0'],
    });
    const rbRun = await startRun(bench, rb.id);
    const [seed] = (await partRows(bench, rb.id)).items;
    await post(bench.inspector, `/api/runs/${rbRun.id}/inspections`, {
      partId: seed!.id,
      unit: 'in',
      readings: topReadings([-0.0002]),
    }).expect(201);
    const sql = (text: string, values: unknown[] = []) => em.getConnection().execute(text, values);
    await sql(
      `insert into lot (id, created_at, lot_number, spec_id, quantity, grind_date)
       select gen_random_uuid(), now(), 'L-QPB-' || g, spec_id, 40, grind_date from lot, generate_series(1, 100) g
        where id = ?`,
      [rb.id],
    );
    await sql(
      `insert into part (id, created_at, lot_id, part_number, serial)
       select gen_random_uuid(), now(), l.id, 'RB-40', l.lot_number || '-' || g
         from lot l, generate_series(1, 40) g where l.lot_number ~ '^L-QPB-[0-9]+$'`,
    );
    await sql(
      `insert into inspection (id, created_at, part_id, run_id, spec_id, master_calibration_id, instrument_id,
              instrument_resolution_mm, master_reading_mm, master_temperature_c, part_temperature_c,
              part_expansion_per_k, master_expansion_per_k, inspector_id, inspector_name)
       select gen_random_uuid(), now(), p.id, i.run_id, i.spec_id, i.master_calibration_id, i.instrument_id,
              i.instrument_resolution_mm, i.master_reading_mm, i.master_temperature_c, i.part_temperature_c,
              i.part_expansion_per_k, i.master_expansion_per_k, i.inspector_id, i.inspector_name
         from part p join lot l on l.id = p.lot_id, inspection i
        where l.lot_number ~ '^L-QPB-[0-9]+$' and i.part_id = ?`,
      [seed!.id],
    );
    await sql(
      `insert into inspection_result (id, created_at, inspection_id, reason, master_calibration_id, height_mm,
              expanded_uncertainty_mm, flatness_mm, parallelism_mm, runout_mm, verdict, computed)
       select gen_random_uuid(), n.created_at, n.id, x.reason, x.master_calibration_id, x.height_mm,
              x.expanded_uncertainty_mm, x.flatness_mm, x.parallelism_mm, x.runout_mm, x.verdict, x.computed
         from inspection n join part p on p.id = n.part_id join lot l on l.id = p.lot_id,
              inspection_result x join inspection s on s.id = x.inspection_id
        where l.lot_number ~ '^L-QPB-[0-9]+$' and s.part_id = ?`,
      [seed!.id],
    );
    await sql('analyze');
  }, 180_000);
  afterAll(() => t.close());

  it('finds a small part number through the indexes, without reading every inspection', async () => {
    const nodes = await plan('QP-7');
    expect(nodes[0]!['Actual Rows']).toBe(3);
    for (const table of ['part', 'part_current'])
      expect(scans(nodes, table).map((n) => n['Node Type'])).not.toContain('Seq Scan');
    expect(nodes.map((n) => n['Index Name'])).toEqual(
      expect.arrayContaining(['part_part_number_serial_unique', 'part_current_pkey']),
    );
    // The records themselves are not read at all: part_current holds each part's current height.
    expect(scans(nodes, 'inspection')).toEqual([]);
    expect(scans(nodes, 'inspection_result')).toEqual([]);
  });

  it('reads a large part number in whole passes, never once per part', async () => {
    const nodes = await plan('RB-40');
    expect(nodes[0]!['Actual Rows']).toBe(COPIES + 1);
    // A scan repeated per part (a nested loop over whole tables) is what made trends take seconds.
    const repeated = nodes.filter((n) => n['Node Type'] === 'Seq Scan' && n['Actual Loops'] > 1);
    expect(repeated.map((n) => n['Relation Name'])).toEqual([]);
    for (const table of ['part', 'part_current'])
      expect(scans(nodes, table).every((n) => n['Actual Loops'] <= 1)).toBe(true);
  });
});
