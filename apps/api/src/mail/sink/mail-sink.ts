import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { Pool } from 'pg';
import { SMTPServer, type SMTPServerAddress } from 'smtp-server';

export interface MailSinkOptions {
  /** 0 picks a free port (tests). */
  port: number;
  databaseUrl: string;
}

export interface MailSink {
  port: number;
  close(): Promise<void>;
}

/** Large enough for a certificate PDF or two; anything bigger is refused by the SMTP dialogue. */
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

const address = (a: SMTPServerAddress | false): string => (a ? a.address : '');

/**
 * A local mail catcher: an SMTP server on the loopback address that takes any message, from anyone
 * to anyone, without TLS or sign-in, and keeps it in `captured_mail` for the Outbox page. It stands
 * in for a real mail server on a workstation and in the tests; it never relays anything.
 */
export async function startMailSink(options: MailSinkOptions): Promise<MailSink> {
  const pool = new Pool({ connectionString: options.databaseUrl, max: 2 });
  // An idle connection dropped by the server must not bring the process down; the next query reconnects.
  pool.on('error', (error) => console.error(`Mail catcher database connection: ${error.message}`));
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    hideSTARTTLS: true,
    logger: false,
    banner: 'Evenset local mail catcher',
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(
            Object.assign(new Error('The message is too large for the local mail catcher.'), { responseCode: 552 }),
          );
          return;
        }
        const raw = Buffer.concat(chunks);
        store(pool, raw, address(session.envelope.mailFrom), session.envelope.rcptTo.map(address)).then(
          () => callback(),
          (error: unknown) => callback(error instanceof Error ? error : new Error(String(error))),
        );
      });
    },
  });
  server.on('error', (error) => console.error(`Mail catcher: ${error.message}`));
  await new Promise<void>((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.server.once('error', onError);
    server.listen(options.port, '127.0.0.1', () => {
      server.server.off('error', onError);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await pool.end();
    },
  };
}

async function store(pool: Pool, raw: Buffer, from: string, to: string[]): Promise<void> {
  const parsed = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, skipTextLinks: true });
  await pool.query(
    'insert into captured_mail (id, created_at, envelope_from, envelope_to, subject, raw) values ($1, now(), $2, $3, $4, $5)',
    [randomUUID(), from, to, parsed.subject ?? '', raw],
  );
}
