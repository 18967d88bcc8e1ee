export const NO_MAIL_SERVER = 'No mail server is configured (SMTP_URL is not set).';

/** Codes from the socket layer (Node) that mean the server was never reached or stopped talking. */
const UNREACHABLE = new Set(['ECONNREFUSED', 'ECONNRESET', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN']);

function serverName(url: string): string {
  try {
    const parsed = new URL(url);
    return parsed.port ? `${parsed.hostname}:${parsed.port}` : parsed.hostname;
  } catch {
    return 'the configured address';
  }
}

function field(error: unknown, key: string): string | undefined {
  if (typeof error !== 'object' || error === null || !(key in error)) return undefined;
  const value = (error as Record<string, unknown>)[key];
  return typeof value === 'string' ? value : undefined;
}

/** Turns a nodemailer/socket error into one plain sentence for the Outbox. */
export function describeSendFailure(error: unknown, url: string): string {
  const server = `The mail server at ${serverName(url)}`;
  const message = error instanceof Error ? error.message : String(error);
  const code = field(error, 'code');
  const socketCode = [...UNREACHABLE].find((known) => known === code || message.includes(known));
  if (socketCode) return `${server} did not answer (${socketCode}).`;
  if (code === 'ETIMEDOUT' || /timeout/i.test(message)) return `${server} did not answer in time.`;
  const response = field(error, 'response');
  if (response) return `${server} refused the message: ${response}`;
  return `${server} could not take the message: ${message}`;
}
