// npm run db:migrate | db:seed | db:stop | db:backup [file] | db:restore -- <file> [--into <name>] [--replace]
// — the database chores, on the same server `npm start` uses (or the one DATABASE_URL names).
import { backupDatabase, restoreDatabase } from './lib/backup.mjs';
import { databaseCommand, ensureDatabases } from './lib/database.mjs';
import { buildIfStale } from './lib/build.mjs';
import { ensureDependencies } from './lib/dependencies.mjs';
import { done, runMain, step, StepError } from './lib/log.mjs';
import { stopLocalPostgres } from './lib/postgres.mjs';

const [command, ...rest] = process.argv.slice(2);

/** `<file> [--into <name>] [--replace]`, in any order. */
function restoreArguments(args) {
  const options = { file: undefined, into: undefined, replace: false };
  for (let i = 0; i < args.length; i += 1) {
    if (args[i] === '--replace') options.replace = true;
    else if (args[i] === '--into') options.into = args[(i += 1)];
    else if (!args[i].startsWith('--') && !options.file) options.file = args[i];
    else
      throw new StepError(
        `Unexpected argument "${args[i]}".`,
        'use: npm run db:restore -- <file> [--into <name>] [--replace]',
      );
  }
  if (!options.file)
    throw new StepError('Which backup?', 'use: npm run db:restore -- <file> [--into <name>] [--replace]');
  if (options.into !== undefined && (options.replace || !/^[a-z_][a-z0-9_]{0,62}$/.test(options.into)))
    throw new StepError(
      '--into takes a new database name of lowercase letters, digits and _ (and not with --replace).',
    );
  return options;
}

await runMain(async () => {
  if (command === 'stop') {
    step('Stopping the project PostgreSQL');
    done(stopLocalPostgres() ? 'stopped' : 'it was not running');
    return;
  }
  if (!['migrate', 'seed', 'backup', 'restore'].includes(command))
    throw new StepError(`Unknown command "${command}".`, 'use migrate, seed, backup, restore or stop.');
  const restore = command === 'restore' ? restoreArguments(rest) : undefined;
  ensureDependencies();
  const urls = await ensureDatabases({ withTest: false });
  if (command === 'backup') {
    backupDatabase(urls.app, rest[0]);
    return;
  }
  if (restore) {
    await restoreDatabase(urls.app, restore.file, restore);
    return;
  }
  buildIfStale(['contracts', 'metrology', 'api']);
  if (command === 'seed') databaseCommand('migrate', urls.app, 'app database');
  databaseCommand(command, urls.app, 'app database');
});
