// The local mail catcher beside the app, unless the user named a real mail server in SMTP_URL.
import { spawn } from 'node:child_process';
import { info } from './log.mjs';
import { ROOT } from './paths.mjs';

/**
 * Starts the catcher (`args` run with node: the compiled entry point, or ts-node and the source)
 * and returns the SMTP_URL the app should use, and how to stop the catcher.
 */
export function startMailSink(args, databaseUrl, extraEnv = {}) {
  if (process.env.SMTP_URL) {
    info(`Mail goes to ${process.env.SMTP_URL} (SMTP_URL); no local mail catcher.`);
    return { smtpUrl: process.env.SMTP_URL, stop: () => {} };
  }
  const port = process.env.MAIL_SINK_PORT || '2525';
  const child = spawn(process.execPath, args, {
    cwd: ROOT,
    stdio: 'inherit',
    env: { ...process.env, ...extraEnv, DATABASE_URL: databaseUrl, MAIL_SINK_PORT: port },
  });
  child.on('exit', (code) => {
    if (code) console.error(`  The local mail catcher stopped (exit ${code}); mail will show as not sent.`);
  });
  info(`Mail goes to the local mail catcher on 127.0.0.1:${port}; the Outbox page shows what it received.`);
  return {
    smtpUrl: `smtp://127.0.0.1:${port}`,
    stop: (signal) => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    },
  };
}
