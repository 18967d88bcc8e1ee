import { startMailSink } from './mail-sink';

/** `node dist/mail/sink/main.js`: the local mail catcher as its own process, for `npm start` and `npm run dev`. */
async function main(): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('Set DATABASE_URL so the mail catcher can keep what it receives.');
  const port = Number(process.env.MAIL_SINK_PORT ?? 2525);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error('MAIL_SINK_PORT must be a port number.');
  const sink = await startMailSink({ port, databaseUrl });
  console.log(`Local mail catcher is listening on 127.0.0.1:${sink.port}`);
  const stop = () => {
    sink.close().then(
      () => process.exit(0),
      () => process.exit(1),
    );
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
