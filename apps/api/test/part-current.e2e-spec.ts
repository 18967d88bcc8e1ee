import { Client } from 'pg';
import { type Bench, givenBench, givenLot, partRows, post, startRun, topReadings } from './setup/bench';
import { startTestApp, type TestApp } from './setup/test-app';

/*
 * part_current is derived data kept by a trigger (migration Migration20261202073000), read by
 * trends in place of the records. Whatever happened, it must equal what the rule of
 * PartStatusService gives from the records themselves: the newest result of each part's newest
 * inspection that no correction superseded. These tests compare the two after saves, a correction,
 * a bulk insert and saves of one part racing in two transactions.
 */

/** The rule, from scratch, over the records: one row a part, as part_current holds it. */
const FROM_RECORDS = `
  select distinct on (c.part_id) c.part_id, c.id as inspection_id, c.created_at as inspected_at, c.run_id,
         c.inspector_id, c.inspector_name, x.height_mm
    from inspection c join inspection_result x on x.inspection_id = c.id
   where not exists (select 1 from inspection n where n.supersedes_id = c.id)
   order by c.part_id, c.created_at desc, c.id desc, x.created_at desc, x.id desc`;

const KEPT = `
  select part_id, inspection_id, inspected_at, run_id, inspector_id, inspector_name, height_mm
    from part_current order by part_id`;

describe('part_current, the current result of each part', () => {
  let t: TestApp;
  let bench: Bench;
  const clients: Client[] = [];

  /** A connection of its own, as a second API process would have. */
  const connect = async () => {
    const client = new Client({ connectionString: t.db.url });
    await client.connect();
    clients.push(client);
    return client;
  };
  const expectKeptAsTheRule = async () => {
    const db = await connect();
    const expected = (await db.query(`select * from (${FROM_RECORDS}) r order by part_id`)).rows;
    expect(expected.length).toBeGreaterThan(0);
    expect((await db.query(KEPT)).rows).toEqual(expected);
  };
  /** A copy of inspection `from` for the same part, without its result yet, in `client`'s transaction. */
  const newInspection = async (client: Client, from: string) =>
    (
      await client.query<{ id: string }>(
        `insert into inspection (id, created_at, part_id, run_id, spec_id, master_calibration_id, instrument_id,
                instrument_resolution_mm, master_reading_mm, master_temperature_c, part_temperature_c,
                part_expansion_per_k, master_expansion_per_k, inspector_id, inspector_name)
         select gen_random_uuid(), now(), part_id, run_id, spec_id, master_calibration_id, instrument_id,
                instrument_resolution_mm, master_reading_mm, master_temperature_c, part_temperature_c,
                part_expansion_per_k, master_expansion_per_k, inspector_id, inspector_name
           from inspection where id = $1
         returning id`,
        [from],
      )
    ).rows[0]!.id;
  /** One result for each of `inspections`, like inspection `from`'s but with the given heights, in one statement. */
  const addResults = (client: Client, from: string, inspections: string[], heightsMm: number[]) =>
    client.query(
      `insert into inspection_result (id, created_at, inspection_id, reason, master_calibration_id, height_mm,
              expanded_uncertainty_mm, flatness_mm, parallelism_mm, runout_mm, verdict, computed)
       select gen_random_uuid(), now(), n.id, reason, master_calibration_id, n.height, expanded_uncertainty_mm,
              flatness_mm, parallelism_mm, runout_mm, verdict, computed
         from inspection_result, unnest($2::uuid[], $3::numeric[]) as n(id, height)
        where inspection_id = $1`,
      [from, inspections, heightsMm],
    );
  /** A copy of inspection `from` with its result, as one save stores them. */
  const copyInspection = async (client: Client, from: string, heightMm: number) => {
    const id = await newInspection(client, from);
    await addResults(client, from, [id], [heightMm]);
    return id;
  };
  const currentOf = async (partId: string) =>
    (await (await connect()).query('select inspection_id, height_mm from part_current where part_id = $1', [partId]))
      .rows[0];

  let partId: string;
  let firstInspection: string;

  beforeAll(async () => {
    t = await startTestApp();
    bench = await givenBench(t);
    const lot = await givenLot(bench, 'L-PC-1', ['K1', 'K2', 'K3']);
    const [k1, k2, k3] = (await partRows(bench, lot.id)).items;
    const run = await startRun(bench, lot.id);
    const inspect = (id: string, reading: number, correcting?: { supersedesId: string; reason: string }) =>
      post(bench.inspector, `/api/runs/${run.id}/inspections`, {
        partId: id,
        unit: 'in',
        readings: topReadings([reading]),
        ...correcting,
      }).expect(201);
    const first = await inspect(k1!.id, -0.0003);
    await inspect(k2!.id, -0.0002);
    await inspect(k3!.id, 0.0001);
    await inspect(k1!.id, -0.0001, { supersedesId: first.body.id, reason: 'Read off the chamfer; measured again.' });
    partId = k2!.id;
    firstInspection = (
      await (await connect()).query<{ id: string }>('select id from inspection where part_id = $1', [partId])
    ).rows[0]!.id;
  }, 120_000);
  afterAll(async () => {
    await Promise.all(clients.map((c) => c.end()));
    await t.close();
  });

  it('equals the rule after saves and a correction through the API', async () => {
    await expectKeptAsTheRule();
  });

  it('equals the rule after one statement inserts the results of several parts', async () => {
    const db = await connect();
    const others = (await db.query<{ id: string }>(`select id from inspection where part_id <> $1`, [partId])).rows;
    await db.query('begin');
    const made = [await newInspection(db, firstInspection), await newInspection(db, others[0]!.id)];
    await addResults(db, firstInspection, made, [38.11, 38.12]);
    await db.query('commit');
    expect(await currentOf(partId)).toEqual({ inspection_id: made[0], height_mm: '38.1100000' });
    await expectKeptAsTheRule();
  });

  it('keeps the newest when two transactions save the same part at once', async () => {
    const [older, newer] = [await connect(), await connect()];
    await older.query('begin');
    await older.query('select now()'); // its inspections take this (earlier) time
    await new Promise((resolve) => setTimeout(resolve, 20));
    await newer.query('begin');
    const newest = await copyInspection(newer, firstInspection, 38.2);
    // The older transaction's save waits in the trigger for the newer one's lock on the part...
    const waiting = copyInspection(older, firstInspection, 38.3);
    await new Promise((resolve) => setTimeout(resolve, 300));
    await newer.query('commit');
    // ...then recomputes seeing the newer inspection, which stays current. Without the lock it
    // would have written its own, computed before the newer one was committed.
    await waiting;
    await older.query('commit');
    expect(await currentOf(partId)).toEqual({ inspection_id: newest, height_mm: '38.2000000' });
    await expectKeptAsTheRule();
  });

  it('keeps the newest when the transaction that started first commits last', async () => {
    const [early, late] = [await connect(), await connect()];
    await early.query('begin');
    await early.query('select now()'); // its inspections take this (earlier) time
    await new Promise((resolve) => setTimeout(resolve, 20));
    await late.query('begin');
    const newer = await copyInspection(late, firstInspection, 38.4);
    await late.query('commit');
    await copyInspection(early, firstInspection, 38.5);
    await early.query('commit');
    // By time of inspection the late transaction's row is the newest, whatever the commit order.
    expect(await currentOf(partId)).toEqual({ inspection_id: newer, height_mm: '38.4000000' });
    await expectKeptAsTheRule();
  });
});
