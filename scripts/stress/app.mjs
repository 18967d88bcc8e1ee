/* global fetch, FormData */
// The built API as `npm start` serves it, started as a child whose PID the stress run holds,
// and a small cookie-keeping client that signs in the way a browser does (CSRF token first).
import { spawn } from 'node:child_process';
import { generateKeyPairSync, randomBytes } from 'node:crypto';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { ROOT } from '../lib/paths.mjs';

export const DEMO_PASSWORD = 'evenset-demo-1';
const CSRF_HEADER = 'x-csrf-token';

/** One signing key shared by the seed (which issues demo certificates) and the server. */
export const SIGNING_KEY = generateKeyPairSync('ed25519')
  .privateKey.export({ format: 'pem', type: 'pkcs8' })
  .toString();
const SESSION_SECRET = randomBytes(32).toString('hex');

export function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

export const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

export async function waitFor(check, timeoutMs, stepMs = 200) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check().catch(() => false)) return true;
    await sleep(stepMs);
  }
  return false;
}

/** Starts apps/api/dist/main.js on `port` over `databaseUrl`; resolves once /api/health answers 200. */
export async function startApi({ port, databaseUrl, smtpUrl }) {
  const child = spawn(process.execPath, [join(ROOT, 'apps/api/dist/main.js')], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      WEB_DIST: join(ROOT, 'apps/web/dist'),
      SESSION_SECRET,
      CERTIFICATE_SIGNING_KEY: SIGNING_KEY,
      LOG_LEVEL: 'error',
      SMTP_URL: smtpUrl,
      // Seventy people sign in from one loopback address within seconds.
      LOGIN_THROTTLE_LIMIT: '1000',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const up = await waitFor(async () => (await fetch(`${baseUrl}/api/health`)).ok, 30_000);
  if (!up) {
    child.kill('SIGKILL');
    throw new Error(`The API did not answer ${baseUrl}/api/health within 30 s.`);
  }
  return { baseUrl, child, pid: child.pid };
}

export function stopApi(api, signal = 'SIGTERM') {
  return new Promise((resolve) => {
    if (api.child.exitCode !== null || api.child.signalCode !== null) return resolve();
    api.child.once('exit', () => resolve());
    process.kill(api.pid, signal);
  });
}

/** A signed-in person: their cookies and CSRF token, for fetch and for autocannon headers. */
export class Session {
  constructor(baseUrl) {
    this.baseUrl = baseUrl;
    this.cookies = new Map();
    this.csrf = '';
  }

  get cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  /** Headers a write needs: the session cookie and the CSRF token. */
  get headers() {
    return { cookie: this.cookieHeader, [CSRF_HEADER]: this.csrf, 'content-type': 'application/json' };
  }

  async request(method, path, body, extraHeaders = {}) {
    const isForm = body instanceof FormData;
    const headers = { ...this.headers, ...extraHeaders };
    if (isForm) delete headers['content-type'];
    const res = await fetch(`${this.baseUrl}${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const at = pair.indexOf('=');
      this.cookies.set(pair.slice(0, at).trim(), pair.slice(at + 1).trim());
    }
    const text = await res.text();
    let json = null;
    try {
      json = text ? JSON.parse(text) : null;
    } catch {
      json = text;
    }
    return { status: res.status, body: json };
  }

  async expect(method, path, body, status) {
    const res = await this.request(method, path, body);
    if (res.status !== status) {
      throw new Error(`${method} ${path} answered ${res.status}, expected ${status}: ${JSON.stringify(res.body)}`);
    }
    return res.body;
  }

  static async signIn(baseUrl, email, password = DEMO_PASSWORD) {
    const session = new Session(baseUrl);
    session.csrf = (await session.expect('GET', '/api/auth/csrf', undefined, 200)).csrfToken;
    session.csrf = (await session.expect('POST', '/api/auth/login', { email, password }, 200)).csrfToken;
    return session;
  }
}
