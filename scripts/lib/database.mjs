import { createRequire } from 'node:module';
import { databaseName, withDatabase } from './database-url.mjs';
import { done, step, StepError } from './log.mjs';
import { API_DB_CLI, ROOT } from './paths.mjs';
import { ensureLocalPostgres, LOCAL_DATABASE_URL, LOCAL_TEST_DATABASE_URL } from './postgres.mjs';
import { run } from './run.mjs';

const requireFromRoot = createRequire(`${ROOT}/package.json`);

/** With DATABASE_URL set, use that server: create the databases there if missing, touch no local cluster. */
async function ensureExternalDatabases(urls) {
  step(`PostgreSQL from DATABASE_URL (${new URL(urls[0]).host})`);
  const { Client } = requireFromRoot('pg');
  const client = new Client({ connectionString: withDatabase(urls[0], 'postgres'), connectionTimeoutMillis: 5000 });
  try {
    await client.connect();
    for (const url of urls) {
      const name = databaseName(url);
      const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
      if (found.rowCount === 0) await client.query(`CREATE DATABASE "${name.replace(/"/g, '""')}"`);
    }
  } catch (error) {
    throw new StepError(
      `Cannot prepare the databases on ${new URL(urls[0]).host}: ${error.message}`,
      'check DATABASE_URL / TEST_DATABASE_URL, that the server runs, and that the user may create databases.',
    );
  } finally {
    await client.end().catch(() => undefined);
  }
  done(`databases ready: ${urls.map(databaseName).join(', ')}`);
}

/** The app's and the tests' connection URLs, with their server running and databases present. */
export async function ensureDatabases({ withTest }) {
  if (process.env.DATABASE_URL) {
    const app = process.env.DATABASE_URL;
    const test = process.env.TEST_DATABASE_URL ?? withDatabase(app, `${databaseName(app)}_test`);
    await ensureExternalDatabases(withTest ? [app, test] : [app]);
    return { app, test };
  }
  ensureLocalPostgres(withTest ? ['evenset', 'evenset_test'] : ['evenset']);
  return { app: LOCAL_DATABASE_URL, test: LOCAL_TEST_DATABASE_URL };
}

/** Runs the API's database command (migrate, seed) against one database. */
export function databaseCommand(command, url, label) {
  step(`${command === 'migrate' ? 'Migrations' : 'Demo data'} (${label})`);
  run(process.execPath, [API_DB_CLI, command], {
    env: { DATABASE_URL: url, LOG_LEVEL: 'warn' },
    advice:
      command === 'migrate'
        ? 'read the error above; a migration that fails leaves the database as it was.'
        : 'read the error above.',
  });
  done(command === 'migrate' ? 'schema is current' : 'demo data loaded');
}
