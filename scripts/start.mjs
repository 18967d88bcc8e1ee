// npm start: install what is missing, start PostgreSQL on loopback, migrate, load the demo data,
// serve the app on http://127.0.0.1:3000 (PORT and HOST change it).
import { spawn } from 'node:child_process';
import { bootstrap } from './bootstrap.mjs';
import { databaseCommand } from './lib/database.mjs';
import { runMain, step } from './lib/log.mjs';
import { API_DIST_MAIN, WEB_DIST } from './lib/paths.mjs';
import { localSecret } from './lib/secrets.mjs';

await runMain(async () => {
  const urls = await bootstrap();
  databaseCommand('seed', urls.app, 'app database');
  step('Serving Evenset (Ctrl-C stops it; PostgreSQL keeps running, `npm run db:stop` stops it)');
  const child = spawn(process.execPath, [API_DIST_MAIN], {
    stdio: 'inherit',
    env: {
      NODE_ENV: 'production',
      SESSION_SECRET: localSecret('session'),
      WEB_DIST,
      ...process.env,
      DATABASE_URL: urls.app,
    },
  });
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
  child.on('exit', (code) => process.exit(code ?? 0));
});
