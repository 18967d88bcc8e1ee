import { readFileSync, rmSync } from 'node:fs';
import { stopServer } from './server';

export default async function globalTeardown(): Promise<void> {
  const file = process.env.EVENSET_SERVER_STATE;
  if (!file) return;
  await stopServer(JSON.parse(readFileSync(file, 'utf8')));
  rmSync(file, { force: true });
}
