// The bench data and server shared by the benchmarks that go through the built app (scripts/bench-api.mjs,
// scripts/bench-web.mjs): a part number with 500 lots and 20,000 inspected parts in its own database
// (evenset_bench, or BENCH_DATABASE_URL), made once: migrated, demo data, then 500 lots copied in SQL
// from one inspected demo part. Reused (and migrated) while it holds them; drop it to start over. The server: bench-server.mjs.
import { createRequire } from 'node:module';
import { join } from 'node:path';
import * as server from './bench-server.mjs';
import { ROOT } from './paths.mjs';

export const LOTS = 500;
export const PARTS_PER_LOT = 40;
const require = createRequire(join(ROOT, 'package.json'));
const { Client } = require('pg');

export const BENCH_URL = process.env.BENCH_DATABASE_URL ?? server.benchDatabaseUrl('evenset_bench');
export const benchName = new URL(BENCH_URL).pathname.slice(1);
export const { sql } = server;

/** The earliest current conforming inspection of the demo data, optionally of another part number than `besides`. */
async function template(besides = null) {
  const [t] = await sql(
    BENCH_URL,
    `select i.id as inspection, i.run_id as run, l.spec_id as spec, p.part_number as part_number
       from inspection i join inspection_result r on r.inspection_id = i.id
       join part p on p.id = i.part_id join lot l on l.id = p.lot_id
      where i.supersedes_id is null and r.verdict = 'conforms' and p.part_number is distinct from $1
      order by i.created_at limit 1`,
    [besides],
  );
  if (!t)
    throw new Error(`The demo data holds no conforming inspection${besides ? ` besides ${besides}` : ''} to copy.`);
  return t;
}

/**
 * `lots` lots numbered <prefix>-0001… of `partsPerLot` parts each, of the template's part number, each
 * part with run, inspection, readings and result copied from the template inspection.
 */
async function copyInspectedLots(t, prefix, lots, partsPerLot) {
  const like = `${prefix}-%`;
  const client = new Client({ connectionString: BENCH_URL });
  await client.connect();
  try {
    await client.query('begin');
    await client.query(
      `insert into lot (id, created_at, lot_number, spec_id, quantity, grind_date)
       select gen_random_uuid(), now(), $4::text || '-' || lpad(g::text, 4, '0'), $1, $2, date '2024-01-01' + g
         from generate_series(1, $3::int) g`,
      [t.spec, partsPerLot, lots, prefix],
    );
    await client.query(
      `insert into bench_run (id, created_at, lot_id, master_id, master_calibration_id, instrument_id, inspector_id,
              inspector_name, master_temperature_c, part_temperature_c, master_start_reading_mm, master_end_reading_mm,
              drift_limit_mm, ended_at)
       select gen_random_uuid(), r.created_at, l.id, r.master_id, r.master_calibration_id, r.instrument_id, r.inspector_id,
              r.inspector_name, r.master_temperature_c, r.part_temperature_c, r.master_start_reading_mm,
              r.master_end_reading_mm, r.drift_limit_mm, r.ended_at
         from lot l cross join bench_run r where l.lot_number like $2 and r.id = $1`,
      [t.run, like],
    );
    await client.query(
      `insert into part (id, created_at, lot_id, part_number, serial)
       select gen_random_uuid(), now(), l.id, $1, l.lot_number || '-' || lpad(g::text, $4::int, '0')
         from lot l cross join generate_series(1, $2::int) g where l.lot_number like $3`,
      [t.part_number, partsPerLot, like, String(partsPerLot).length],
    );
    await client.query(
      `insert into inspection (id, created_at, part_id, run_id, spec_id, master_calibration_id, instrument_id,
              instrument_resolution_mm, master_reading_mm, master_temperature_c, part_temperature_c,
              part_expansion_per_k, master_expansion_per_k, inspector_id, inspector_name)
       select gen_random_uuid(), now() + (row_number() over (order by p.serial)) * interval '1 ms', p.id, r.id,
              i.spec_id, i.master_calibration_id, i.instrument_id, i.instrument_resolution_mm, i.master_reading_mm,
              i.master_temperature_c, i.part_temperature_c, i.part_expansion_per_k, i.master_expansion_per_k,
              i.inspector_id, i.inspector_name
         from part p join lot l on l.id = p.lot_id join bench_run r on r.lot_id = l.id
         cross join inspection i where l.lot_number like $2 and i.id = $1`,
      [t.inspection, like],
    );
    await client.query(
      `insert into inspection_reading (id, created_at, inspection_id, position, station, kind, reading_mm)
       select gen_random_uuid(), n.created_at, n.id, x.position, x.station, x.kind, x.reading_mm
         from inspection n join part p on p.id = n.part_id join lot l on l.id = p.lot_id
         cross join inspection_reading x where l.lot_number like $2 and x.inspection_id = $1`,
      [t.inspection, like],
    );
    // Heights spread by ±0.0005 mm around the copied one, deterministic per serial, within the band.
    await client.query(
      `insert into inspection_result (id, created_at, inspection_id, reason, master_calibration_id, height_mm,
              expanded_uncertainty_mm, flatness_mm, parallelism_mm, runout_mm, verdict, computed)
       select gen_random_uuid(), n.created_at, n.id, x.reason, x.master_calibration_id, h.height,
              x.expanded_uncertainty_mm, x.flatness_mm, x.parallelism_mm, x.runout_mm, x.verdict,
              jsonb_set(x.computed, '{height}', to_jsonb(h.height))
         from inspection n join part p on p.id = n.part_id join lot l on l.id = p.lot_id
         cross join inspection_result x
         cross join lateral (select x.height_mm + ((abs(hashtext(p.serial)) % 21) - 10) * 0.00005 as height) h
        where l.lot_number like $2 and x.inspection_id = $1`,
      [t.inspection, like],
    );
    await client.query('commit');
  } catch (error) {
    await client.query('rollback');
    throw error;
  } finally {
    await client.end();
  }
  // As autovacuum does after many inserts: statistics, and the visibility map index-only scans need.
  await sql(BENCH_URL, 'vacuum analyze lot, part, bench_run, inspection, inspection_reading, inspection_result');
}

export async function ensureBenchData() {
  const [row] = await sql(BENCH_URL, `select count(*)::int as n from part where serial like 'BL-%'`).catch(() => [
    { n: 0 },
  ]);
  if (row.n === LOTS * PARTS_PER_LOT) {
    server.migrate(BENCH_URL);
    return false;
  }
  await server.freshDemoDatabase(BENCH_URL);
  await copyInspectedLots(await template(), 'BL', LOTS, PARTS_PER_LOT);
  return true;
}

/** Parts in the biggest lot the product allows (lots.schema.ts: quantity at most 10,000). */
export const BIG_LOT_PARTS = 10000;
export const BIG_LOT_NUMBER = 'BIG-0001';

/**
 * One lot of BIG_LOT_PARTS inspected parts, of another part number than the 500 lots (their trends
 * stay as they are); made once, after ensureBenchData. Answers its id.
 */
export async function ensureBigLot() {
  const find = () => sql(BENCH_URL, 'select id from lot where lot_number = $1', [BIG_LOT_NUMBER]);
  const [found] = await find();
  if (found) return found.id;
  const [{ partNumber }] = await sql(
    BENCH_URL,
    `select part_number as "partNumber" from part where serial = 'BL-0001-01'`,
  );
  await copyInspectedLots(await template(partNumber), 'BIG', 1, BIG_LOT_PARTS);
  const [made] = await find();
  return made.id;
}

/** The built API (and web) over the bench database. */
export const startApi = () => server.startApi(BENCH_URL);

/** Signs in as a demo account (the engineer unless told); returns the Cookie header to send. */
export async function signIn(base, email = 'engineer@kestrel.example') {
  return (await server.signIn(base, email)).headers().cookie;
}
