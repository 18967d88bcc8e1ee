import { apiErrorSchema, CSRF_HEADER, type GaugeStudyTurn, type Role } from '@evenset/contracts';
import fc from 'fast-check';
import { Client } from 'pg';
import type request from 'supertest';
import { type Bench, givenBench, givenLot, post, RB40_STATIONS, startRun } from './setup/bench';
import { releasedAt20C } from './setup/replacement-parts';
import { type CataloguedRoute, catalogueRoutes } from './setup/route-catalogue';
import { givenCustomer, givenSoldSets } from './setup/sets';
import { anonymousBrowser, type Browser, givenUser, signInAs, startTestApp, type TestApp } from './setup/test-app';

// Random and malformed input sent to every route that changes something, and to every list's query
// string: the server never answers 5xx, every refusal has the one error shape and names the field,
// and a refused request leaves every table exactly as it was. Fixed seeds keep every run the same.
const SEED = 20261202;
const BODY_RUNS = 12;
const QUERY_RUNS = 8;
const CSV_RUNS = 24;

type Verb = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One request to send: the concrete URL and how its body is written. */
interface Attempt {
  url: string;
  send?: { contentType: string; content: string | Buffer; encoding?: string };
  multipart?: { fields: [string, string][]; file?: { field: string; content: Buffer; name: string } };
}

// ---- arbitraries -------------------------------------------------------------------------------

/** Strings that trip parsers: number look-alikes, dates that do not exist, control and odd unicode. */
const trickyText = fc.constantFrom(
  '',
  ' ',
  'NaN',
  'Infinity',
  '-Infinity',
  '1e309',
  '-0',
  '0x1F',
  '1,5',
  '１２',
  '−0.0002',
  'null',
  'undefined',
  'true',
  '2026-02-30',
  '2026-13-01',
  '9999-99-99T99:99',
  '00000000-0000-4000-8000-000000000000',
  "' or 1=1 --",
  '"); drop table lot; --',
  '<script>alert(1)</script>',
  '\u0000',
  '\ud800',
  '\u202e\u0301',
  '🧲🔩',
  'x'.repeat(10_000),
  '%00',
  '../../etc/passwd',
);

const junkScalar = fc.oneof(
  fc.string(),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  trickyText,
  fc.integer(),
  fc.double(),
  fc.constantFrom(1e308, -1e308, 2 ** 53 + 1, -1, 0, 0.5, Number.MAX_SAFE_INTEGER),
  fc.boolean(),
  fc.constant(null),
);

/** A value of any type in place of a field: scalars, nested junk, arrays. */
const junkValue = fc.oneof(
  { arbitrary: junkScalar, weight: 4 },
  fc.array(junkScalar, { maxLength: 4 }),
  fc.dictionary(fc.string({ maxLength: 8 }), junkScalar, { maxKeys: 3 }),
  fc.jsonValue({ maxDepth: 3 }),
);

/** A nesting deep enough to trouble a recursive walk, still under the body size limit. */
const deeplyNested = (depth: number) => '{"a":'.repeat(depth) + '1' + '}'.repeat(depth);

const json = (value: unknown) => ({ contentType: 'application/json', content: JSON.stringify(value) ?? 'null' });

/** Bodies for a route whose contract has `fields`: right keys with wrong values, anything at all, bad text. */
function bodies(fields: string[]) {
  const rightKeysWrongTypes =
    fields.length > 0
      ? fc.record(Object.fromEntries(fields.map((f) => [f, junkValue])), { requiredKeys: [] })
      : fc.dictionary(fc.string({ maxLength: 10 }), junkValue, { maxKeys: 4 });
  const withExtraKeys = fc
    .tuple(rightKeysWrongTypes, fc.dictionary(fc.string({ maxLength: 12 }), junkValue, { maxKeys: 3 }))
    .map(([a, b]) => ({ ...b, ...a }));
  return fc.oneof(
    { arbitrary: rightKeysWrongTypes.map(json), weight: 5 },
    { arbitrary: withExtraKeys.map(json), weight: 2 },
    fc.jsonValue({ maxDepth: 4 }).map(json),
    fc.array(rightKeysWrongTypes, { minLength: 1, maxLength: 3 }).map(json),
    fc
      .constantFrom(
        '{',
        '{"a":',
        '[1,2',
        '{"a":1}}',
        "{'a':1}",
        'nul',
        '{"a":1,}',
        '\ufeff{}',
        '{"__proto__":{"isAdmin":true}}',
        '{"constructor":{"prototype":{"x":1}}}',
        deeplyNested(2_000),
        '"' + 'x'.repeat(1_000_000) + '"',
        // Over the 2 MB body limit.
        '"' + 'x'.repeat(2_200_000) + '"',
      )
      .map((content) => ({ contentType: 'application/json', content })),
    fc
      .tuple(
        fc.constantFrom('application/json; charset=klingon', 'application/json; charset=utf-16', 'application/json'),
        fc.constantFrom(undefined, 'gzip', 'deflate', 'br', 'compress'),
      )
      .map(([contentType, encoding]) => ({ contentType, content: '{}', encoding })),
    fc.string({ maxLength: 60 }).map((content) => ({ contentType: 'application/json', content })),
    fc
      .tuple(
        fc.constantFrom(
          'text/plain',
          'application/xml',
          'application/x-www-form-urlencoded',
          'application/octet-stream',
        ),
        rightKeysWrongTypes,
      )
      .map(([contentType, value]) => ({
        contentType,
        content:
          contentType === 'application/x-www-form-urlencoded'
            ? new URLSearchParams(
                Object.entries(value).map(([k, v]): [string, string] => [k, JSON.stringify(v) ?? '']),
              ).toString()
            : JSON.stringify(value),
      })),
    fc
      .uint8Array({ maxLength: 200 })
      .map((bytes) => ({ contentType: 'application/json', content: Buffer.from(bytes) })),
  );
}

/** Multipart forms: the contract's fields as junk text, with or without a file of junk or near-miss content. */
function multipartForms(fields: string[], fileField: string) {
  const file = fc.oneof(
    fc.uint8Array({ maxLength: 300 }).map((b) => Buffer.from(b)),
    fc.uint8Array({ maxLength: 100 }).map((b) => Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.from(b)])),
    fc.constant(Buffer.alloc(0)),
  );
  return fc.record({
    fields: fc.array(
      fc.tuple(
        fc.oneof(fc.constantFrom(...fields, 'extra'), fc.string({ minLength: 1, maxLength: 8 })),
        fc.oneof(fc.string(), trickyText),
      ),
      { maxLength: fields.length + 2 },
    ),
    file: fc.option(
      fc.record({
        field: fc.constantFrom(fileField, 'other'),
        content: file,
        name: fc.constantFrom('cert.pdf', 'scan.png', 'x.exe', 'readings.csv', ''),
      }),
      { nil: undefined },
    ),
  });
}

/** %-escapes text; a lone surrogate, which has no UTF-8 form, goes as U+FFFD as a browser would send it. */
const escapeText = (text: string) => encodeURIComponent(Buffer.from(text, 'utf8').toString('utf8'));

const TWO_FILES =
  '--zz\r\nContent-Disposition: form-data; name="file"; filename="a"\r\n\r\na\r\n--zz\r\nContent-Disposition: form-data; name="file"; filename="b"\r\n\r\nb\r\n--zz--\r\n';

/** Multipart text a client could get wrong: no boundary, cut short, a broken part header, two files. */
const brokenMultipart = fc
  .constantFrom(
    '',
    '--zz\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nabc',
    '--zz\r\nContent-Dispo\r\n\r\nabc\r\n--zz--\r\n',
    TWO_FILES,
    '--zz\r\nContent-Disposition: form-data; name="other"; filename="a"\r\n\r\na\r\n--zz--\r\n',
    '--zz\r\nContent-Disposition: form-data; name=""\r\n\r\nx\r\n--zz--\r\n',
  )
  .chain((content) =>
    fc
      .constantFrom('multipart/form-data; boundary=zz', 'multipart/form-data', 'multipart/form-data; boundary=')
      .map((contentType) => ({ contentType, content })),
  );

/** A path segment in place of an id: the real row's id most often, else a stranger. */
function idSegment(real: string) {
  return fc.oneof(
    { arbitrary: fc.constant(real), weight: 4 },
    fc.uuid(),
    fc
      .oneof(
        fc.string({ minLength: 1 }),
        trickyText.filter((s) => s.length > 0),
      )
      .map(escapeText),
    fc.constantFrom('%E0%A4%A', '%', '%zz', '..', '0', '-1', '1e400'),
  );
}

/** Query strings: the contract's keys and strangers, repeated and bracketed, with junk and bad escapes. */
function queryStrings(fields: string[]) {
  const key = fc.oneof(
    { arbitrary: fc.constantFrom(...fields), weight: 4 },
    fc.string({ minLength: 1, maxLength: 8 }).map(escapeText),
  );
  const value = fc.oneof(
    fc.string().map(escapeText),
    fc.string({ unit: 'grapheme', maxLength: 20 }).map(escapeText),
    trickyText.map(escapeText),
    fc.integer().map(String),
    fc.constantFrom('501', '0', '1.5', 'name:asc', 'name:up', ':asc', 'createdAt%3Adesc', '%', '%E0%A4%A', 'a%26b'),
  );
  const pair = fc
    .tuple(key, value, fc.constantFrom('plain', 'twice', 'bracket'))
    .map(([k, v, form]) =>
      form === 'twice' ? `${k}=${v}&${k}=${v}` : form === 'bracket' ? `${k}[x]=${v}` : `${k}=${v}`,
    );
  return fc.array(pair, { maxLength: 6 }).map((pairs) => pairs.join('&'));
}

/** CSV text for a run: good and bad headers, real and stranger serials, readings that are not numbers. */
function csvFiles(serials: string[]) {
  const header = fc.oneof(
    { arbitrary: fc.constant('serial,station,reading,unit'), weight: 4 },
    fc.constantFrom(
      'serial,station,reading',
      'Serial,Station,Reading,Unit',
      'station,serial,unit,reading',
      'serial;station;reading;unit',
      'serial,station,reading,unit,extra',
      'serial,serial,reading,unit',
      '',
    ),
    fc.array(fc.string({ maxLength: 8 }), { maxLength: 5 }).map((cells) => cells.join(',')),
  );
  const reading = fc.oneof(
    fc.double({ min: -0.001, max: 0.001, noNaN: true }).map((n) => n.toFixed(5)),
    fc.double().map(String),
    fc.constantFrom('', 'abc', 'NaN', '1e400', '0,0001', '−0.0002', ' -0.0002 ', '"-0.0002"', '0x1'),
  );
  const row = fc
    .tuple(
      fc.oneof(fc.constantFrom(...serials), fc.string({ maxLength: 8 })),
      fc.oneof(fc.constantFrom(...RB40_STATIONS), fc.string({ maxLength: 4 })),
      reading,
      fc.oneof(fc.constantFrom('in', 'mm', 'IN', 'µm', ''), fc.string({ maxLength: 3 })),
      fc.constantFrom('', ',', ',,', ',"unclosed', '"'),
    )
    .map(([serial, station, value, unit, tail]) => `${serial},${station},${value},${unit}${tail}`);
  const text = fc
    .tuple(header, fc.array(row, { maxLength: 12 }), fc.constantFrom('\n', '\r\n', '\r'), fc.boolean())
    .map(([head, rows, eol, bom]) => Buffer.from(`${bom ? '\ufeff' : ''}${[head, ...rows].join(eol)}`, 'utf8'));
  return fc.oneof(
    { arbitrary: text, weight: 6 },
    fc.uint8Array({ maxLength: 2_000 }).map((b) => Buffer.from(b)),
    fc.constant(Buffer.alloc(0)),
    fc.constant(Buffer.from([0xff, 0xfe, 0x73, 0x00, 0x65, 0x00])), // UTF-16 with its BOM
  );
}

/** False when a path segment holds a broken %-escape, which the router cannot decode. */
const readable = (url: string) =>
  url
    .split('?')[0]!
    .split('/')
    .every((segment) => {
      try {
        decodeURIComponent(segment);
        return true;
      } catch {
        return false;
      }
    });

// ---- the fixture world and the checks ---------------------------------------------------------

describe('bad input on every route', () => {
  let t: TestApp;
  let bench: Bench;
  let routes: CataloguedRoute[];
  let db: Client;
  const browsers = new Map<Role, Browser>();
  /** Real ids by the path segment that names the thing, e.g. `lots` → a lot's id. */
  const realIds = new Map<string, string>();
  let unmeasuredSerials: string[];
  let fingerprintSql: string;
  let baseline: Map<string, string>;
  const tally = { routes: new Set<string>(), requests: 0, accepted: 0, refused: 0 };
  const started = Date.now();

  beforeAll(async () => {
    t = await startTestApp();
    // Listening once spares every request a listen and close of its own.
    await t.app.listen(0, '127.0.0.1');
    bench = await givenBench(t);
    routes = catalogueRoutes(t.app);
    browsers.set('engineer', bench.engineer);
    browsers.set('inspector', bench.inspector);
    // One person for the office roles: each sign-in costs a slow password hash.
    const office = await signInAs(t.app, ['sales', 'service', 'admin']);
    for (const role of ['sales', 'service', 'admin'] as const) browsers.set(role, office);
    const sales = browsers.get('sales')!;

    // Released parts sold as a set with its certificate, a free part ground on request, a run with
    // parts still to measure, a gauge study with one measurement, a person, an e-mail in the outbox.
    const released = await releasedAt20C(bench, 'L-BAD-1', {
      'B-1': -0.0003,
      'B-2': -0.00031,
      'B-3': -0.00032,
      'B-4': -0.0003,
      'G-1': -0.0001,
    });
    const customer = await givenCustomer(sales, 'Anvil Tooling');
    const [set] = await givenSoldSets(sales, { customerId: customer.id, orderReference: 'PO-BAD-1' }, [
      ['B-1', 'B-2', 'B-3', 'B-4'].map((s) => released.ids[s]!),
    ]);
    const certificate = (await post(sales, `/api/sets/${set!.id}/certificates`).expect(201)).body as { id: string };
    const mailed = await post(sales, `/api/certificates/${certificate.id}/email`, {}).expect(200);
    const grind = await post(browsers.get('service')!, '/api/grind-requests', {
      originalSetId: set!.id,
      partId: released.ids['G-1'],
    }).expect(201);
    unmeasuredSerials = ['U-1', 'U-2', 'U-3'];
    const lot = await givenLot(bench, 'L-BAD-2', unmeasuredSerials);
    const run = await startRun(bench, lot.id);
    const person = await givenUser(t.app, ['inspector']);
    const me = (await bench.inspector.agent.get('/api/auth/me').expect(200)).body as { user: { id: string } };
    const study = (
      await post(bench.engineer, '/api/gauge-studies', {
        name: 'Bad input study',
        specId: bench.spec.id,
        partIds: [released.ids['B-1'], released.ids['B-2']],
        inspectorIds: [me.user.id, person.id],
        trials: 2,
        instrumentId: bench.indicator.id,
        masterId: bench.master.id,
      }).expect(201)
    ).body as { id: string };
    const turn = (await bench.inspector.agent.get(`/api/gauge-studies/${study.id}/next`).expect(200))
      .body as GaugeStudyTurn;
    const measured = (
      await post(bench.inspector, `/api/gauge-studies/${study.id}/measurements`, {
        slotId: turn.next!.slotId,
        unit: 'in',
        reading: -0.0002,
      }).expect(201)
    ).body as GaugeStudyTurn;

    for (const [segment, id] of Object.entries({
      certificates: certificate.id,
      sets: set!.id,
      customers: customer.id,
      'grind-requests': (grind.body as { id: string }).id,
      lots: lot.id,
      parts: released.ids['G-1']!,
      runs: run.id,
      specs: bench.spec.id,
      materials: bench.steel.id,
      instruments: bench.indicator.id,
      masters: bench.master.id,
      users: person.id,
      'gauge-studies': study.id,
      measurements: measured.lastSaved!.measurementId,
      messages: (mailed.body as { messageId: string }).messageId,
      trends: 'RB-40',
    }))
      realIds.set(segment, id);

    db = new Client({ connectionString: t.db.url });
    await db.connect();
    // Every table but the session store (a signed-in request renews its session's expiry). Rows and
    // the newest row version's transaction id: an insert, update or delete changes one of the two.
    const tables = await db.query<{ name: string }>(
      `select c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
        where n.nspname = 'public' and c.relkind in ('r', 'p') and c.relname <> 'session' order by 1`,
    );
    fingerprintSql = tables.rows
      .map(
        ({ name }) =>
          `select '${name}' as name, count(*) || ':' || coalesce(max(xmin::text::bigint), 0) as print from "${name}"`,
      )
      .join(' union all ');
    baseline = await fingerprint();
  }, 120_000);

  afterAll(async () => {
    await db?.end();
    await t?.close();
    const seconds = ((Date.now() - started) / 1000).toFixed(1);
    process.stdout.write(
      `bad input: ${tally.routes.size} routes, ${tally.requests} requests (${tally.refused} refused, ${tally.accepted} accepted), ${seconds} s\n`,
    );
  });

  /** Row count and newest row version of every table. */
  async function fingerprint(): Promise<Map<string, string>> {
    // A named statement is planned once: planning the union is most of its cost.
    const res = await db.query<{ name: string; print: string }>({ name: 'fingerprint', text: fingerprintSql });
    return new Map(res.rows.map((r) => [r.name, r.print]));
  }

  const browserFor = async (route: CataloguedRoute): Promise<Browser> => {
    if (route.isPublic) return anonymousBrowser(t.app);
    // Signing out ends the caller's session: that route gets a person of its own.
    if (route.path === '/api/auth/logout') return signInAs(t.app, route.roles!.slice(0, 1));
    return browsers.get(route.roles![0]!)!;
  };

  function send(browser: Browser, method: string, attempt: Attempt): request.Test {
    const verb = method.toLowerCase() as Verb;
    let req = (browser.agent as unknown as Record<Verb, (url: string) => request.Test>)[verb](attempt.url);
    if (verb !== 'get') req = req.set(CSRF_HEADER, browser.csrf);
    if (attempt.send) {
      req = req.set('Content-Type', attempt.send.contentType);
      if (attempt.send.encoding) req = req.set('Content-Encoding', attempt.send.encoding);
      req = req.send(attempt.send.content);
    }
    if (attempt.multipart) {
      for (const [name, value] of attempt.multipart.fields) req = req.field(name, value);
      const file = attempt.multipart.file;
      if (file) req = req.attach(file.field, file.content, file.name || 'upload');
    }
    return req;
  }

  /**
   * Sends one request and answers what is wrong with its answer, if anything. A request the server
   * accepts (random input can be valid) moves the baseline; a refused one must leave it untouched.
   */
  async function check(
    route: CataloguedRoute,
    browser: Browser,
    attempt: Attempt,
    detailPath = /\S/,
  ): Promise<{ res: request.Response; problem?: string }> {
    tally.routes.add(`${route.method} ${route.path}`);
    tally.requests += 1;
    const res = await send(browser, route.method, attempt);
    const after = await fingerprint();
    const before = baseline;
    baseline = after;
    const label = `${route.method} ${attempt.url.slice(0, 200)} → ${res.status}`;
    if (res.status >= 500) return { res, problem: `${label} ${JSON.stringify(res.body)}` };
    if (res.status < 300) {
      tally.accepted += 1;
      return { res };
    }
    tally.refused += 1;
    if (res.status < 400) return { res, problem: `${label}: not a refusal` };
    // Node's HTTP parser answers a request line over its 16 KB header limit itself; the app never sees it.
    if (res.status === 431) return { res };
    const shape = apiErrorSchema.safeParse(res.body);
    if (!shape.success)
      return { res, problem: `${label}: not the error shape: ${JSON.stringify(res.body).slice(0, 200)}` };
    // A body or an address that cannot be read at all has no field to name; every other 400 names
    // its fields, and an upload to a readable address names the field its file belongs in.
    if (res.status === 400 && (shape.data.code !== 'BAD_REQUEST' || (attempt.multipart && readable(attempt.url)))) {
      const details = shape.data.details ?? [];
      if (details.length === 0 || details.some((d) => !detailPath.test(d.path)))
        return {
          res,
          problem: `${label} ${shape.data.code}: names no field: ${JSON.stringify(details).slice(0, 300)}`,
        };
    }
    const changed = [...after].filter(([name, print]) => before.get(name) !== print).map(([name]) => name);
    if (changed.length > 0)
      return { res, problem: `${label} ${shape.data.code}: refused, yet changed ${changed.join(', ')}` };
    return { res };
  }

  /** The concrete URL for a route with `segments` as its `:params`. */
  const urlOf = (route: CataloguedRoute, segments: string[]) => {
    let i = 0;
    return route.path.replace(/:[A-Za-z]+/g, () => segments[i++]!);
  };

  /** The path segment before each `:param` says what it is; its real id comes from the fixture world. */
  const realIdFor = (route: CataloguedRoute, param: string) => {
    const parts = route.path.split('/');
    return realIds.get(parts[parts.indexOf(`:${param}`) - 1]!);
  };

  /** Ids for every `:param` of a route, real or strange. */
  const pathSegments = (route: CataloguedRoute) =>
    fc.tuple(...route.params.map((p) => idSegment(realIdFor(route, p)!))) as fc.Arbitrary<string[]>;

  /**
   * Runs `examples`, then `runs` generated requests against a route, collecting what went wrong.
   * Each route has a seed of its own (fixed), so the kinds of junk spread over the routes.
   */
  async function exercise(
    route: CataloguedRoute,
    attempts: fc.Arbitrary<Attempt>,
    runs: number,
    failures: string[],
    { detailPath, examples = [] }: { detailPath?: RegExp; examples?: Attempt[] } = {},
  ): Promise<void> {
    const browser = await browserFor(route);
    const seed = [...`${route.method} ${route.path}`].reduce((h, c) => (h * 31 + c.charCodeAt(0)) | 0, SEED);
    await fc.assert(
      fc.asyncProperty(attempts, async (attempt) => {
        const { problem } = await check(route, browser, attempt, detailPath);
        if (problem) failures.push(problem);
      }),
      { seed, numRuns: runs, examples: examples.map((e) => [e]) },
    );
  }

  /** The route's URL with the fixture world's real ids. */
  const realUrl = (route: CataloguedRoute) =>
    urlOf(
      route,
      route.params.map((p) => realIdFor(route, p)!),
    );

  /** What every write route is sent at least once: no body, a cut-off JSON, an array, plain text. */
  const everyRouteGets = (route: CataloguedRoute): Attempt[] =>
    [
      undefined,
      { contentType: 'application/json', content: '{"' },
      json([{}]),
      { contentType: 'text/plain', content: 'hello' },
    ].map((send) => ({ url: realUrl(route), send }));

  const writes = () => routes.filter((r) => r.method !== 'GET');
  const csvRoutes = () => writes().filter((r) => /\/readings\/(preview|import)$/.test(r.path));

  it('knows a real row for every id in the path of every route it sends to', () => {
    const targets = [...writes(), ...routes.filter((r) => r.method === 'GET' && r.queryFields)];
    expect(writes().length).toBeGreaterThan(40);
    const unknown = targets.flatMap((r) => r.params.filter((p) => !realIdFor(r, p)).map((p) => `${r.path} :${p}`));
    expect(unknown).toEqual([]);
    expect(csvRoutes().map((r) => r.path)).toEqual(['/api/runs/:id/readings/preview', '/api/runs/:id/readings/import']);
  });

  it('keeps the cases that once failed: refused with their own code, naming the field, saving nothing', async () => {
    const find = (method: string, path: string) => routes.find((r) => r.method === method && r.path === path)!;
    const startRun = find('POST', '/api/runs');
    const login = find('POST', '/api/auth/login');
    const upload = find('POST', '/api/runs/:id/readings/import');
    const importUrl = `/api/runs/${realIds.get('runs')!}/readings/import`;
    const cases: [CataloguedRoute, Attempt, number, string, string?][] = [
      // body-parser's refusals other than bad JSON answered 500: too large, unknown charset, broken gzip.
      [startRun, { url: '/api/runs', send: json('x'.repeat(2_200_000)) }, 413, 'TOO_LARGE'],
      [
        startRun,
        { url: '/api/runs', send: { ...json({}), contentType: 'application/json; charset=klingon' } },
        415,
        'UNSUPPORTED_MEDIA_TYPE',
      ],
      [startRun, { url: '/api/runs', send: { ...json({}), encoding: 'gzip' } }, 400, 'BAD_REQUEST'],
      // A body that is not an object, or none, was refused with an empty path.
      [startRun, { url: '/api/runs', send: json([{ lotId: 1 }]) }, 400, 'VALIDATION_FAILED', 'body'],
      [
        startRun,
        { url: '/api/runs', send: { contentType: 'text/plain', content: '{}' } },
        400,
        'VALIDATION_FAILED',
        'body',
      ],
      [login, { url: '/api/auth/login', send: json(['a']) }, 400, 'VALIDATION_FAILED', 'body'],
      // Multer's refusals (a file under another name, two files) were a bare 400 about JSON.
      [
        upload,
        {
          url: importUrl,
          multipart: { fields: [], file: { field: 'readings', content: Buffer.from('serial'), name: 'r.csv' } },
        },
        400,
        'UPLOAD_UNREADABLE',
        'file',
      ],
      [
        upload,
        { url: importUrl, send: { contentType: 'multipart/form-data; boundary=zz', content: TWO_FILES } },
        400,
        'UPLOAD_UNREADABLE',
        'file',
      ],
    ];
    for (const [route, attempt, status, code, path] of cases) {
      const { res, problem } = await check(route, await browserFor(route), attempt);
      expect([route.path, res.status, (res.body as { code?: string }).code, problem]).toEqual([
        route.path,
        status,
        code,
        undefined,
      ]);
      if (path) expect((res.body as { details: { path: string }[] }).details.map((d) => d.path)).toEqual([path]);
    }
  });

  it('sees a write in the fingerprint: an accepted request moves it', async () => {
    const before = baseline;
    const { res } = await check(
      routes.find((r) => r.method === 'POST' && r.path === '/api/customers')!,
      browsers.get('sales')!,
      {
        url: '/api/customers',
        send: json({ name: 'Fingerprint Works', contactEmail: 'buyer@fingerprint.example' }),
      },
    );
    expect(res.status).toBe(201);
    expect([...baseline].filter(([name, print]) => before.get(name) !== print).map(([name]) => name)).toContain(
      'customer',
    );
  });

  it('answers random and malformed bodies on every write route without 5xx, naming fields, saving nothing', async () => {
    const failures: string[] = [];
    for (const route of writes().filter((r) => !csvRoutes().includes(r))) {
      const json = bodies(route.bodyFields).map((send): Omit<Attempt, 'url'> => ({ send }));
      const forms = route.takesFile
        ? fc.oneof(
            {
              arbitrary: multipartForms(route.bodyFields, 'certificate').map((multipart) => ({ multipart })),
              weight: 3,
            },
            brokenMultipart.map((send) => ({ send })),
            json,
          )
        : json;
      const attempts = fc
        .tuple(pathSegments(route), forms)
        .map(([segments, form]): Attempt => ({ url: urlOf(route, segments), ...form }));
      await exercise(route, attempts, BODY_RUNS, failures, { examples: everyRouteGets(route) });
    }
    expect(failures).toEqual([]);
  }, 120_000);

  it('answers random query strings on every list without 5xx, naming fields', async () => {
    const failures: string[] = [];
    for (const route of routes.filter((r) => r.method === 'GET' && r.queryFields)) {
      const attempts = fc
        .tuple(pathSegments(route), queryStrings(route.queryFields!))
        .map(([segments, query]): Attempt => ({ url: `${urlOf(route, segments)}?${query}` }));
      await exercise(route, attempts, QUERY_RUNS, failures);
    }
    expect(failures).toEqual([]);
  }, 60_000);

  it('answers random and malformed CSV files without 5xx, naming row and column, importing nothing', async () => {
    const failures: string[] = [];
    for (const route of csvRoutes()) {
      const upload = fc
        .tuple(csvFiles(unmeasuredSerials), fc.constantFrom('file', 'file', 'file', 'readings'))
        .map(([content, field]) => ({ multipart: { fields: [], file: { field, content, name: 'readings.csv' } } }));
      const attempts = fc
        .tuple(
          pathSegments(route),
          fc.oneof(
            { arbitrary: upload, weight: 8 },
            brokenMultipart.map((send) => ({ send })),
          ),
        )
        .map(([segments, form]): Attempt => ({ url: urlOf(route, segments), ...form }));
      // A problem in the file names its row (and column); else the file field or the run id.
      await exercise(route, attempts, CSV_RUNS, failures, {
        detailPath: /^(row \d+(, \S.*)?|file|id)$/,
        examples: everyRouteGets(route),
      });
    }
    expect(failures).toEqual([]);
  }, 60_000);
});
