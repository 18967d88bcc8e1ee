import { writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startServer } from './server';

export const SERVER_STATE = join(tmpdir(), `evenset-browser-${process.ppid}-${process.pid}.json`);

/** Starts the built app once for all browser tests; workers read its address from the env. */
export default async function globalSetup(): Promise<void> {
  const server = await startServer({ LOGIN_THROTTLE_LIMIT: '4' });
  process.env.EVENSET_BASE_URL = server.baseUrl;
  process.env.EVENSET_SERVER_STATE = SERVER_STATE;
  writeFileSync(SERVER_STATE, JSON.stringify(server));
}
