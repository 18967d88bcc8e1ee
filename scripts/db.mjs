// npm run db:migrate | db:seed | db:stop — the database chores, on the same server `npm start` uses.
import { databaseCommand, ensureDatabases } from './lib/database.mjs';
import { buildIfStale } from './lib/build.mjs';
import { ensureDependencies } from './lib/dependencies.mjs';
import { done, runMain, step, StepError } from './lib/log.mjs';
import { stopLocalPostgres } from './lib/postgres.mjs';

const command = process.argv[2];

await runMain(async () => {
  if (command === 'stop') {
    step('Stopping the project PostgreSQL');
    done(stopLocalPostgres() ? 'stopped' : 'it was not running');
    return;
  }
  if (command !== 'migrate' && command !== 'seed')
    throw new StepError(`Unknown command "${command}".`, 'use migrate, seed or stop.');
  ensureDependencies();
  const urls = await ensureDatabases({ withTest: false });
  buildIfStale(['contracts', 'metrology', 'api']);
  if (command === 'seed') databaseCommand('migrate', urls.app, 'app database');
  databaseCommand(command, urls.app, 'app database');
});
