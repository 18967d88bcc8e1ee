// The built API on a database of its own, for the benchmarks that write (bench save, CSV import):
// a fresh database migrated and loaded with the demo data, the API started as `npm start` runs it,
// and signed-in sessions that send JSON or files with their CSRF token.
/* global fetch, FormData, Blob -- Node 20 has them; the lint config predates them in .mjs scripts */
import { spawn, spawnSync } from 'node:child_process';
import { generateKeyPairSync, randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { withDatabase } from './database-url.mjs';
import { API_DB_CLI, API_DIST_MAIN, ROOT, WEB_DIST } from './paths.mjs';
import { LOCAL_DATABASE_URL } from './postgres.mjs';

const require = createRequire(join(ROOT, 'package.json'));
const { Client } = require('pg');

// One certificate key for the demo data and the server, kept with nothing else: this is a throwaway.
const signingKey = generateKeyPairSync('ed25519').privateKey.export({ format: 'pem', type: 'pkcs8' }).toString();

/** The URL of database `name` on the server of DATABASE_URL (the local cluster by default). */
export function benchDatabaseUrl(name) {
  return withDatabase(process.env.DATABASE_URL ?? LOCAL_DATABASE_URL, name);
}

export async function sql(url, text, values) {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query(text, values)).rows;
  } finally {
    await client.end();
  }
}

function cli(url, command) {
  const out = spawnSync(process.execPath, [API_DB_CLI, command], {
    env: { ...process.env, DATABASE_URL: url, CERTIFICATE_SIGNING_KEY: signingKey, LOG_LEVEL: 'warn' },
    encoding: 'utf8',
  });
  if (out.status !== 0) throw new Error(`${command} of ${url} failed:\n${out.stderr}${out.stdout}`);
}

/** Drops and makes database `url` again: migrated, with the demo data. */
export async function freshDemoDatabase(url) {
  const name = new URL(url).pathname.slice(1);
  const admin = withDatabase(url, 'postgres');
  await sql(admin, `drop database if exists "${name}" with (force)`);
  await sql(admin, `create database "${name}"`);
  cli(url, 'migrate');
  cli(url, 'seed');
}

/** Applies pending migrations to database `url` (a reused bench database must match the code it measures). */
export const migrate = (url) => cli(url, 'migrate');

/** Node flags for the API under measurement, e.g. BENCH_NODE_ARGS="--cpu-prof" to see where its time goes. */
const nodeArgs = process.env.BENCH_NODE_ARGS?.split(/\s+/).filter(Boolean) ?? [];

/** Starts dist/main.js on a free loopback port over database `url`; resolves once /api/health answers. */
export async function startApi(url) {
  const port = 45000 + Math.floor(Math.random() * 1000);
  const child = spawn(process.execPath, [...nodeArgs, API_DIST_MAIN], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: url,
      WEB_DIST,
      SESSION_SECRET: randomBytes(32).toString('hex'),
      CERTIFICATE_SIGNING_KEY: signingKey,
      LOG_LEVEL: 'error',
      SMTP_URL: 'smtp://127.0.0.1:9',
      LOGIN_THROTTLE_LIMIT: '1000',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 150; i += 1) {
    const up = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return { base, child };
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill();
  throw new Error('The API did not answer /api/health within 30 s.');
}

/** Peak resident memory (VmHWM, MB) of a process, from /proc (Linux). */
export function peakRssMb(pid) {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8').match(/^VmHWM:\s+(\d+) kB$/m);
  if (!line) throw new Error(`No VmHWM for process ${pid}.`);
  return Number(line[1]) / 1024;
}

/**
 * Signs in as a demo account (password of the demo data); answers the session's headers
 * (cookie and CSRF token) and `call(method, path, body)`, which sends JSON or a FormData and
 * throws on an answer other than 2xx.
 */
export async function signIn(base, email) {
  const jar = new Map();
  const keep = (res) =>
    res.headers.getSetCookie().forEach((c) => {
      const [pair] = c.split(';');
      const at = pair.indexOf('=');
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    });
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  keep(csrfRes);
  let { csrfToken } = await csrfRes.json();
  const headers = () => ({ cookie: cookie(), 'x-csrf-token': csrfToken });
  const call = async (method, path, body) => {
    const json = body !== undefined && !(body instanceof FormData);
    const res = await fetch(`${base}${path}`, {
      method,
      headers: { ...headers(), ...(json ? { 'content-type': 'application/json' } : {}) },
      body: json ? JSON.stringify(body) : body,
    });
    keep(res);
    const text = await res.text();
    if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${text.slice(0, 500)}`);
    return text ? JSON.parse(text) : undefined;
  };
  // Signing in starts a new session with a token of its own.
  ({ csrfToken } = await call('POST', '/api/auth/login', { email, password: 'evenset-demo-1' }));
  return { headers, call };
}

/** A multipart body carrying `content` as field `file`. */
export function fileForm(content, name) {
  const form = new FormData();
  form.append('file', new Blob([content], { type: 'text/csv' }), name);
  return form;
}

/**
 * Through the API as the demo engineer: a released copy of a demo spec with a 5 × 5 grid of
 * stations over its top face (a 25-station plan), and a lot of it with `parts` serials.
 */
export async function givenGridLot(engineer, { partNumber, lotNumber, parts, prefix }) {
  const specs = await engineer.call('GET', '/api/specs?pageSize=100');
  const model = specs.items.find((s) => s.partNumber === 'RB-40' && s.status === 'released');
  if (!model) throw new Error('The demo data has no released RB-40 spec to copy.');
  const { definition } = await engineer.call('GET', `/api/specs/${model.id}`);
  // Answers give the definition in mm: 5 mm in from the edges of the 40 mm face, 7.5 mm apart.
  const stations = Array.from({ length: 25 }, (_, i) => ({
    name: `S${i + 1}`,
    x: 5 + (i % 5) * 7.5,
    y: 5 + Math.floor(i / 5) * 7.5,
  }));
  const draft = await engineer.call('POST', '/api/specs', {
    partNumber,
    definition: { ...definition, plan: { stations, datumStations: [], runoutCircles: [] } },
  });
  const spec = await engineer.call('POST', `/api/specs/${draft.id}/release`);
  const lot = await engineer.call('POST', '/api/lots', {
    lotNumber,
    specId: spec.id,
    quantity: parts,
    grindDate: '2026-11-20',
  });
  for (let start = 1; start <= parts; start += 1000)
    await engineer.call('POST', `/api/lots/${lot.id}/parts`, {
      pattern: { prefix, start, count: Math.min(1000, parts - start + 1), digits: 5 },
    });
  return { spec, lot, stations: stations.map((s) => s.name) };
}

/** Starts a run on `lotId` as `inspector` with a usable demo master and instrument. */
export async function startRun(inspector, lotId) {
  const masters = await inspector.call('GET', '/api/masters?pageSize=100');
  const instruments = await inspector.call('GET', '/api/instruments?pageSize=100');
  const usable = (g) => ['in-service', 'due-soon'].includes(g.status);
  const master = masters.items.find(usable);
  const instrument = instruments.items.find(usable);
  if (!master || !instrument) throw new Error('The demo data has no usable master and instrument.');
  return inspector.call('POST', '/api/runs', {
    lotId,
    masterId: master.id,
    instrumentId: instrument.id,
    unit: 'in',
    masterTemperature: 20.5,
    partTemperature: 21,
    masterStartReading: 0,
  });
}
