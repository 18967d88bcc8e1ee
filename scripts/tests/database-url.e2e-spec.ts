import { execFileSync, spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Client } from 'pg';

// DATABASE_URL points the scripts at another running PostgreSQL: they create the database
// there, migrate it, and leave the project's own cluster alone.
jest.setTimeout(120_000);

const ROOT = join(__dirname, '../..');
const bin = join('/usr/lib/postgresql', readdirSync('/usr/lib/postgresql').sort().pop() ?? '', 'bin');
const asPostgres = (command: string, args: string[]) =>
  process.getuid?.() === 0
    ? execFileSync('runuser', ['-u', 'postgres', '--', command, ...args], { stdio: 'pipe' })
    : execFileSync(command, args, { stdio: 'pipe' });

describe('DATABASE_URL pointing at another server', () => {
  const folder = mkdtempSync(join(tmpdir(), 'evenset-other-pg-'));
  const data = join(folder, 'data');
  const port = 55000 + Math.floor(Math.random() * 900);

  beforeAll(() => {
    chmodSync(folder, 0o777);
    asPostgres(join(bin, 'initdb'), ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8']);
    asPostgres(join(bin, 'pg_ctl'), [
      '-D',
      data,
      '-w',
      '-o',
      `-k ${folder} -p ${port} -c listen_addresses=127.0.0.1`,
      '-l',
      join(folder, 'log'),
      'start',
    ]);
  });

  afterAll(() => {
    if (existsSync(join(data, 'postmaster.pid')))
      asPostgres(join(bin, 'pg_ctl'), ['-D', data, '-m', 'immediate', 'stop']);
    rmSync(folder, { recursive: true, force: true });
  });

  it('creates and migrates the database on that server', async () => {
    const url = `postgres://postgres@127.0.0.1:${port}/evenset_elsewhere`;
    const result = spawnSync(process.execPath, [join(ROOT, 'scripts/db.mjs'), 'migrate'], {
      env: { ...process.env, DATABASE_URL: url },
      encoding: 'utf8',
    });
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout).toContain(`PostgreSQL from DATABASE_URL (127.0.0.1:${port})`);
    expect(result.stdout).not.toContain('54329');
    const client = new Client({ connectionString: url });
    await client.connect();
    const tables = await client.query<{ table_name: string }>(
      `select table_name from information_schema.tables where table_schema = 'public' order by 1`,
    );
    await client.end();
    expect(tables.rows.map((r) => r.table_name)).toEqual(
      expect.arrayContaining(['app_user', 'audit_entry', 'session', 'schema_migration']),
    );
  });
});
