// npm start: install what is missing, start PostgreSQL on loopback, migrate, load the demo data,
// serve the app on http://127.0.0.1:3000 (PORT and HOST change it). Without SMTP_URL, a local mail
// catcher on 127.0.0.1:2525 (MAIL_SINK_PORT) receives the app's mail; the Outbox page shows it.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { bootstrap } from './bootstrap.mjs';
import { databaseCommand } from './lib/database.mjs';
import { runMain, step } from './lib/log.mjs';
import { API_DIST_MAIN, ROOT, WEB_DIST } from './lib/paths.mjs';
import { startMailSink } from './lib/mail-sink.mjs';
import { localSecret, localSigningKey } from './lib/secrets.mjs';

await runMain(async () => {
  const urls = await bootstrap();
  // The demo seed issues certificates too: it must sign with the key the server will verify with.
  process.env.CERTIFICATE_SIGNING_KEY ??= localSigningKey();
  databaseCommand('seed', urls.app, 'app database');
  const mail = startMailSink([join(ROOT, 'apps/api/dist/mail/sink/main.js')], urls.app);
  step('Serving Evenset (Ctrl-C stops it; PostgreSQL keeps running, `npm run db:stop` stops it)');
  const child = spawn(process.execPath, [API_DIST_MAIN], {
    stdio: 'inherit',
    env: {
      NODE_ENV: 'production',
      SESSION_SECRET: localSecret('session'),
      WEB_DIST,
      ...process.env,
      SMTP_URL: mail.smtpUrl,
      DATABASE_URL: urls.app,
    },
  });
  for (const signal of ['SIGINT', 'SIGTERM'])
    process.on(signal, () => {
      mail.stop(signal);
      child.kill(signal);
    });
  child.on('exit', (code) => {
    mail.stop('SIGTERM');
    process.exit(code ?? 0);
  });
});
