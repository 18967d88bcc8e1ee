// Load: signed-in inspectors saving inspections and people reading lot reviews at the same time,
// bounded in time and in count; then every answer is checked against what the database holds.
import autocannon from 'autocannon';
import { randomBytes } from 'node:crypto';
import { loadavg } from 'node:os';
import { Session } from './app.mjs';

const PASSWORD = `stress-${randomBytes(6).toString('hex')}-Kq`;
const STATIONS = ['P1', 'P2', 'P3', 'P4', 'P5'];

/** Nearest-rank percentile of sorted values (ms). */
export function percentile(sorted, p) {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function people(admin, baseUrl, count, role, tag) {
  const sessions = [];
  for (let i = 0; i < count; i++) {
    const email = `stress-${tag}-${i}@stress.example`;
    await admin.expect(
      'POST',
      '/api/users',
      { email, displayName: `Stress ${tag} ${i}`, roles: [role], password: PASSWORD },
      201,
    );
    sessions.push(await Session.signIn(baseUrl, email, PASSWORD));
  }
  return sessions;
}

/** `lots` lots of RB-40 rev B with `size` parts each, made through the API as the engineer. */
async function lotsOf(engineer, db, lots, size) {
  const spec = await db.query(`select id from part_spec where part_number = 'RB-40' and revision = 'B'`);
  const tag = Date.now() % 100000;
  const made = [];
  for (let n = 0; n < lots; n++) {
    const lotNumber = `L-LOAD-${tag}-${n}`;
    const body = { lotNumber, specId: spec.rows[0].id, quantity: size, grindDate: '2026-11-20' };
    const lot = await engineer.expect('POST', '/api/lots', body, 201);
    const pattern = { prefix: `${lotNumber}-`, start: 0, count: size, digits: 4 };
    await engineer.expect('POST', `/api/lots/${lot.id}/parts`, { pattern }, 201);
    const parts = await db.query('select id from part where lot_id = $1 order by serial', [lot.id]);
    made.push({ lotId: lot.id, partIds: parts.rows.map((r) => r.id) });
  }
  return made;
}

function track(instance, into) {
  instance.on('response', (_client, status, _bytes, ms) => {
    into.latencies.push(ms);
    into.status[status] = (into.status[status] ?? 0) + 1;
  });
  instance.on('reqError', () => {
    into.transportErrors += 1;
  });
}

/** Keeps the first few refusals' bodies, so a failing run says what went wrong. */
const refusal = (group) => (status, body) => {
  if ((status < 200 || status >= 300) && group.refusals.length < 3)
    group.refusals.push(`${status} ${body.slice(0, 300)}`);
};

const summary = (label, group) => {
  const sorted = [...group.latencies].sort((a, b) => a - b);
  const ok = Object.entries(group.status)
    .filter(([s]) => s.startsWith('2'))
    .reduce((sum, [, n]) => sum + n, 0);
  return {
    traffic: label,
    requests: sorted.length,
    '2xx': ok,
    'non-2xx': sorted.length - ok,
    'transport errors': group.transportErrors,
    'p50 ms': Math.round(percentile(sorted, 50)),
    'p95 ms': Math.round(percentile(sorted, 95)),
    'p99 ms': Math.round(percentile(sorted, 99)),
    'max ms': Math.round(sorted.at(-1) ?? NaN),
  };
};

export async function loadCheck({
  baseUrl,
  db,
  admin,
  engineer,
  seconds,
  inspectors,
  readers,
  partsPerInspector,
  check,
}) {
  const ids = await db.query(
    `select (select id from master_gauge where code = 'MG-1.500-A') as master,
            (select id from instrument where code = 'IND-01') as instrument`,
  );
  const { master, instrument } = ids.rows[0];
  // Each inspector works through a lot of their own, as at the bench; readers review those lots.
  const lots = await lotsOf(engineer, db, inspectors, partsPerInspector);
  const inspectorSessions = await people(admin, baseUrl, inspectors, 'inspector', 'inspector');
  const readerSessions = await people(admin, baseUrl, readers, 'engineer', 'reader');
  const runs = [];
  for (const [i, s] of inspectorSessions.entries()) {
    const body = {
      lotId: lots[i].lotId,
      masterId: master,
      instrumentId: instrument,
      unit: 'in',
      masterTemperature: 20.5,
      partTemperature: 21,
      masterStartReading: 0,
    };
    runs.push((await s.expect('POST', '/api/runs', body, 201)).id);
  }
  console.log(
    `  ${inspectors} inspectors (a lot of ${partsPerInspector} parts and a run each) and ${readers} readers signed in; ` +
      `up to ${seconds} s or ${partsPerInspector} saves per inspector`,
  );

  const saves = { latencies: [], status: {}, transportErrors: 0, refusals: [] };
  const reads = { latencies: [], status: {}, transportErrors: 0, refusals: [] };
  /** Inspection ids the server answered 2xx for, read from the answers themselves. */
  const answered = new Set();
  let sent = 0;
  const started = Date.now();
  const inspectorRuns = inspectorSessions.map((session, i) => {
    const mine = lots[i].partIds;
    let next = 0;
    const instance = autocannon({
      url: baseUrl,
      connections: 1,
      duration: seconds,
      timeout: 30,
      maxConnectionRequests: partsPerInspector,
      requests: [
        {
          method: 'POST',
          path: `/api/runs/${runs[i]}/inspections`,
          headers: session.headers,
          // Each request a different part of this inspector's lot, never one part twice.
          setupRequest: (req) => {
            sent += 1;
            const partId = mine[Math.min(next++, mine.length - 1)];
            const base = -0.0002 + (next % 7) * 0.00001;
            const readings = STATIONS.map((station, k) => ({
              station,
              reading: Number((base + k * 0.000005).toFixed(6)),
            }));
            return { ...req, body: JSON.stringify({ partId, unit: 'in', readings }) };
          },
          onResponse: (status, body) => {
            if (status >= 200 && status < 300) answered.add(JSON.parse(body).id);
            else refusal(saves)(status, body);
          },
        },
      ],
    });
    track(instance, saves);
    return instance;
  });
  const readerRuns = readerSessions.map((session, i) => {
    const lotId = lots[i % lots.length].lotId;
    const headers = { cookie: session.cookieHeader };
    const instance = autocannon({
      url: baseUrl,
      connections: 1,
      duration: seconds,
      timeout: 30,
      requests: [
        { method: 'GET', path: `/api/lots/${lotId}`, headers, onResponse: refusal(reads) },
        { method: 'GET', path: `/api/lots/${lotId}/parts?page=1&pageSize=50`, headers, onResponse: refusal(reads) },
      ],
    });
    track(instance, reads);
    return instance;
  });
  await Promise.all(inspectorRuns);
  // The readers read for as long as the inspectors save.
  readerRuns.forEach((r) => r.stop());
  await Promise.all(readerRuns);
  const elapsed = (Date.now() - started) / 1000;
  // Requests cut off by the time limit may still be saved by the server: let them finish.
  await new Promise((resolve) => setTimeout(resolve, 2000));

  const rows = [summary(`${inspectors} inspectors saving`, saves), summary(`${readers} readers of lot reviews`, reads)];
  console.table(rows);
  console.log(
    `  machine load average during the run: ${loadavg()
      .map((n) => n.toFixed(1))
      .join(' / ')} (1/5/15 min)`,
  );
  for (const line of [...saves.refusals, ...reads.refusals]) console.log(`  refused: ${line}`);
  const lotIds = lots.map((l) => l.lotId);
  const stored = (
    await db.query(
      `select i.id, i.part_id, (select count(*)::int from inspection_reading r where r.inspection_id = i.id) as readings
         from inspection i join part p on p.id = i.part_id where p.lot_id = any($1::uuid[])`,
      [lotIds],
    )
  ).rows;
  const storedIds = new Set(stored.map((r) => r.id));
  const lost = [...answered].filter((id) => !storedIds.has(id)).length;
  const partial = stored.filter((r) => r.readings !== STATIONS.length).length;
  const parts = new Set(stored.map((r) => r.part_id)).size;
  const unanswered = stored.filter((r) => !answered.has(r.id)).length;
  const inFlight = sent - rows[0].requests;
  const errors = rows[0]['non-2xx'] + rows[1]['non-2xx'] + rows[0]['transport errors'] + rows[1]['transport errors'];
  check(
    'load: zero errors',
    errors === 0 && answered.size > 0,
    `${rows[0].requests + rows[1].requests} answers in ${elapsed.toFixed(1)} s ` +
      `(${(answered.size / elapsed).toFixed(0)} saves/s, ${(rows[1].requests / elapsed).toFixed(0)} reads/s); ` +
      `non-2xx ${rows[0]['non-2xx'] + rows[1]['non-2xx']}, transport errors ${rows[0]['transport errors'] + rows[1]['transport errors']}`,
  );
  check(
    'load: nothing lost (every 2xx save is in the database, with all its readings)',
    lost === 0 && partial === 0,
    `${answered.size} saves answered 2xx, ${lost} of them missing; ${stored.length} inspections stored, ${partial} without all ${STATIONS.length} readings; ` +
      `${unanswered} stored from the ${inFlight} request(s) in flight when the time ran out`,
  );
  check(
    'load: nothing duplicated (one inspection per part)',
    parts === stored.length && unanswered <= inFlight,
    `${stored.length} inspections over ${parts} distinct parts`,
  );
  return { rows, elapsed, answered: answered.size, stored: stored.length };
}

/** Twenty requests allocating the same parts at once: exactly one wins. */
export async function setRaceCheck({ baseUrl, db, admin, check, racers = 20 }) {
  const customers = await admin.expect('GET', '/api/customers', undefined, 200);
  const customerId = customers.items[0].id;
  const proposal = await admin.expect('POST', '/api/sets/proposal', { partNumber: 'RB-40', setCount: 1 }, 200);
  if (!proposal.sets.length) throw new Error('The seeded stock has no RB-40 set to allocate.');
  const partIds = proposal.sets[0].parts.map((p) => p.id);
  const sessions = [];
  for (let i = 0; i < racers; i++) sessions.push(await Session.signIn(baseUrl, 'sales@kestrel.example'));
  const before = (await db.query('select count(*)::int as n from matched_set')).rows[0].n;
  const orderReference = `PO-RACE-${Date.now() % 100000}`;
  const answers = await Promise.all(
    sessions.map((s) =>
      s.request('POST', '/api/sets', { partNumber: 'RB-40', customerId, orderReference, sets: [{ partIds }] }),
    ),
  );
  const statuses = answers.map((a) => a.status);
  const won = statuses.filter((s) => s === 201).length;
  const refused = statuses.filter((s) => s === 409).length;
  const sets = (
    await db.query(`select count(distinct m.set_id)::int as n from set_member m where m.part_id = any($1::uuid[])`, [
      partIds,
    ])
  ).rows[0].n;
  const after = (await db.query('select count(*)::int as n from matched_set')).rows[0].n;
  check(
    `sets: ${racers} concurrent allocations of the same ${partIds.length} parts, exactly one wins`,
    won === 1 && refused === racers - 1 && sets === 1 && after === before + 1,
    `${won} × 201, ${refused} × 409, other ${racers - won - refused}; ${sets} set holds those parts, ${after - before} new set(s)`,
  );
  const winner = answers.find((a) => a.status === 201);
  return { setId: winner?.body.items[0].id, won, refused };
}
