// npm run db:backup / db:restore: pg_dump and pg_restore from Debian's PostgreSQL, over TCP with the
// app's own role, so the same code serves the project cluster and a server named by DATABASE_URL.
import { existsSync, mkdirSync, readdirSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { databaseName, withDatabase } from './database-url.mjs';
import { done, info, step, StepError } from './log.mjs';
import { DATA_DIR, ROOT } from './paths.mjs';
import { run } from './run.mjs';

const requireFromRoot = createRequire(`${ROOT}/package.json`);
export const BACKUP_DIR = join(DATA_DIR, 'backups');
export const DEFAULT_RESTORE_DATABASE = 'evenset_restored';

/** The newest /usr/lib/postgresql/<v>/bin holding pg_dump and pg_restore. */
function clientBin() {
  const base = '/usr/lib/postgresql';
  const versions = existsSync(base)
    ? readdirSync(base)
        .filter((v) => existsSync(join(base, v, 'bin', 'pg_dump')) && existsSync(join(base, v, 'bin', 'pg_restore')))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (versions.length === 0)
    throw new StepError(
      'pg_dump and pg_restore were not found under /usr/lib/postgresql.',
      'run `npm start` once (it installs Debian\'s "postgresql" package), or install it by hand.',
    );
  return join(base, versions[0], 'bin');
}

/**
 * libpq's environment for a connection URL. The password travels in PGPASSWORD rather than on the
 * command line, where any user of the machine could read it in the process list.
 */
function connectionEnv(url) {
  const parsed = new URL(url);
  return {
    PGHOST: decodeURIComponent(parsed.hostname),
    PGPORT: parsed.port || '5432',
    PGUSER: decodeURIComponent(parsed.username),
    PGPASSWORD: decodeURIComponent(parsed.password),
    PGDATABASE: databaseName(url),
    ...(parsed.searchParams.get('sslmode') ? { PGSSLMODE: parsed.searchParams.get('sslmode') } : {}),
  };
}

const quoteIdent = (name) => `"${name.replace(/"/g, '""')}"`;

function timestamp() {
  return new Date().toISOString().replace(/[-:]/g, '').replace(/\..*$/, 'Z');
}

/** pg_dump -Fc of the database at `url` into `target` (a file, or a folder for a timestamped name). */
export function backupDatabase(url, target) {
  const file = target ? resolve(target) : join(BACKUP_DIR, `${databaseName(url)}-${timestamp()}.dump`);
  step(`Backing up ${databaseName(url)} (${new URL(url).host}) into ${file}`);
  mkdirSync(dirname(file), { recursive: true });
  run(join(clientBin(), 'pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`], {
    env: connectionEnv(url),
    quiet: true,
    advice:
      'check that the server runs and the connection details are right; pg_dump must not be older than the server.',
  });
  done(`${(statSync(file).size / 1024).toFixed(0)} kB written`);
  return file;
}

async function withServer(url, work) {
  const { Client } = requireFromRoot('pg');
  const client = new Client({ connectionString: withDatabase(url, 'postgres'), connectionTimeoutMillis: 5000 });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end().catch(() => undefined);
  }
}

/**
 * pg_restore of `file` into a database that must not exist yet, in one transaction: either every
 * table, row, index and trigger is there, or the new database is dropped again.
 */
async function restoreIntoNew(url, file, name) {
  const exists = await withServer(url, async (client) => {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${quoteIdent(name)} TEMPLATE template0`);
    return found.rowCount > 0;
  });
  if (exists)
    throw new StepError(
      `Database "${name}" already exists; a restore only writes into a new database.`,
      `drop it first, or name another with --into <name>.`,
    );
  try {
    run(
      join(clientBin(), 'pg_restore'),
      ['--no-owner', '--no-privileges', '--exit-on-error', '--single-transaction', `--dbname=${name}`, file],
      {
        env: connectionEnv(withDatabase(url, name)),
        quiet: true,
        advice: 'the backup file may be damaged or from a newer PostgreSQL.',
      },
    );
  } catch (error) {
    await withServer(url, (client) => client.query(`DROP DATABASE IF EXISTS ${quoteIdent(name)}`));
    throw error;
  }
}

/**
 * Restores `file` into a fresh database (default evenset_restored) on the server of `url`. With
 * `replace`, the restored copy then takes the app database's name, and the old one is kept under
 * <name>_replaced_<timestamp> rather than dropped, so a wrong file can be undone.
 */
export async function restoreDatabase(url, file, { into, replace = false } = {}) {
  const source = resolve(file);
  if (!existsSync(source))
    throw new StepError(`No backup file at ${source}.`, 'give the path of a .dump written by npm run db:backup.');
  const appName = databaseName(url);
  const target = replace ? `${appName}_restoring_${timestamp().toLowerCase()}` : (into ?? DEFAULT_RESTORE_DATABASE);
  step(`Restoring ${source} into a new database "${target}" (${new URL(url).host})`);
  await restoreIntoNew(url, source, target);
  done('restored');
  if (!replace) {
    info(`To use it: DATABASE_URL=${withDatabase(url, target).replace(/:[^:@/]*@/, ':***@')}`);
    return target;
  }
  const kept = `${appName}_replaced_${timestamp().toLowerCase()}`;
  step(`Putting the restored copy in place of "${appName}" (the old one is kept as "${kept}")`);
  await withServer(url, async (client) => {
    const busy = await client.query('SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = $1', [appName]);
    if (busy.rows[0].n > 0)
      throw new StepError(
        `"${appName}" has ${busy.rows[0].n} open connection(s); the restored copy stays in "${target}".`,
        'stop the app (and anything else connected), then run the restore again.',
      );
    await client.query(`ALTER DATABASE ${quoteIdent(appName)} RENAME TO ${quoteIdent(kept)}`);
    await client.query(`ALTER DATABASE ${quoteIdent(target)} RENAME TO ${quoteIdent(appName)}`);
  });
  done(`"${appName}" now holds the backup`);
  return appName;
}
