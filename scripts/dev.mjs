// npm run dev: the API with reload on change (ts-node with swc) and Vite with hot reload,
// on the same database as npm start. The web app proxies /api to the API.
import { spawn } from 'node:child_process';
import { bootstrap } from './bootstrap.mjs';
import { runMain, step } from './lib/log.mjs';
import { ROOT } from './lib/paths.mjs';
import { startMailSink } from './lib/mail-sink.mjs';
import { localSecret, localSigningKey } from './lib/secrets.mjs';

await runMain(async () => {
  const urls = await bootstrap();
  step('Dev servers: API on http://127.0.0.1:3000, web on http://127.0.0.1:5173 (Ctrl-C stops both)');
  const tsNode = {
    TS_NODE_PROJECT: 'apps/api/tsconfig.json',
    TS_NODE_SWC: 'true',
    TS_NODE_TRANSPILE_ONLY: 'true',
  };
  const mail = startMailSink(
    ['-r', 'ts-node/register', '-r', 'tsconfig-paths/register', 'apps/api/src/mail/sink/main.ts'],
    urls.app,
    tsNode,
  );
  const children = [
    spawn(
      process.execPath,
      [
        '--watch',
        '--watch-path=apps/api/src',
        '--watch-path=packages',
        '-r',
        'ts-node/register',
        '-r',
        'tsconfig-paths/register',
        'apps/api/src/main.ts',
      ],
      {
        cwd: ROOT,
        stdio: 'inherit',
        env: {
          ...process.env,
          DATABASE_URL: urls.app,
          SMTP_URL: mail.smtpUrl,
          SESSION_SECRET: localSecret('session'),
          CERTIFICATE_SIGNING_KEY: process.env.CERTIFICATE_SIGNING_KEY ?? localSigningKey(),
          ...tsNode,
        },
      },
    ),
    spawn(process.execPath, [`${ROOT}/node_modules/vite/bin/vite.js`, '--host', '127.0.0.1'], {
      cwd: `${ROOT}/apps/web`,
      stdio: 'inherit',
    }),
  ];
  const stop = (signal) => {
    mail.stop(signal);
    children.forEach((child) => child.kill(signal));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  await Promise.all(children.map((child) => new Promise((resolve) => child.on('exit', resolve))));
  mail.stop('SIGTERM');
});
