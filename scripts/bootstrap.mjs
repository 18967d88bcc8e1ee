// The shared first half of `npm start` and `npm test`. Uses only Node's own modules until
// `npm ci` has run, so it works on a fresh clone.
import { buildIfStale } from './lib/build.mjs';
import { databaseCommand, ensureDatabases } from './lib/database.mjs';
import { ensureDependencies } from './lib/dependencies.mjs';

export async function bootstrap({ withTest = false } = {}) {
  ensureDependencies();
  const urls = await ensureDatabases({ withTest });
  buildIfStale();
  databaseCommand('migrate', urls.app, 'app database');
  if (withTest) databaseCommand('migrate', urls.test, 'test database');
  return urls;
}
