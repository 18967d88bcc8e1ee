import { createServer } from 'node:net';
import type { INestApplication } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { simpleParser, type ParsedMail } from 'mailparser';
import { CapturedMail } from '../../src/mail/captured-mail.entity';

/** A loopback port free right now, so the app can be told where the mail catcher will listen. */
export async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

/** Every message the catcher stored, oldest first, parsed by mailparser (not by our code). */
export async function capturedMail(app: INestApplication): Promise<(ParsedMail & { envelopeTo: string[] })[]> {
  const em = app.get(EntityManager).fork();
  const rows = await em.find(CapturedMail, {}, { populate: ['raw'], orderBy: { createdAt: 'asc', id: 'asc' } });
  return Promise.all(rows.map(async (row) => ({ ...(await simpleParser(row.raw)), envelopeTo: row.envelopeTo })));
}

/** Waits for a message the app sends after answering (a reset link goes out in the background). */
export async function waitForMail(
  app: INestApplication,
  matches: (mail: ParsedMail & { envelopeTo: string[] }) => boolean,
  timeoutMs = 10_000,
): Promise<ParsedMail & { envelopeTo: string[] }> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await capturedMail(app)).find(matches);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No matching message reached the mail catcher in ${timeoutMs} ms.`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
