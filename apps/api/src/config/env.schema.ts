import { validateCronExpression } from 'cron';
import { z } from 'zod';

const flag = z
  .enum(['true', 'false', '1', '0'], { error: 'Use true or false.' })
  .transform((v) => v === 'true' || v === '1');

/** Every environment variable the API reads; `.env.example` documents each one. */
export const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  DATABASE_URL: z.url({
    error: 'Set DATABASE_URL to a postgres:// connection URL.',
  }),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters.').optional(),
  /** Express "trust proxy": set when a TLS-terminating proxy sits in front, so cookies get `secure`. */
  TRUST_PROXY: z.string().optional(),
  COOKIE_SECURE: flag.optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  WEB_DIST: z.string().optional(),
  LOGIN_THROTTLE_LIMIT: z.coerce.number().int().min(1).default(10),
  LOGIN_THROTTLE_TTL_SECONDS: z.coerce.number().int().min(1).default(60),
  EVENSET_ADMIN_EMAIL: z.string().optional(),
  EVENSET_ADMIN_PASSWORD: z.string().optional(),
  /** Address people reach the app at, for links in e-mails and the certificate's QR code. */
  PUBLIC_URL: z.url({ error: 'Set PUBLIC_URL to the http(s) address of the app.' }).optional(),
  /** The shop's name and postal address, printed on certificates. */
  SHOP_NAME: z.string().min(1).default('Kestrel Workholding'),
  SHOP_ADDRESS: z.string().min(1).default('14 Millrace Lane, Harwick Industrial Park'),
  /** Ed25519 private key (PKCS#8 PEM) that signs certificates; required in production. */
  CERTIFICATE_SIGNING_KEY: z.string().optional(),
  /** Outgoing mail server, e.g. smtp://127.0.0.1:2525; unset, messages are recorded as not sent. */
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Evenset <evenset@kestrel.example>'),
  /** When the calibration-due digest goes to engineers (cron, server time): 06:00 every day. */
  MAIL_DIGEST_CRON: z
    .string()
    .refine((value) => validateCronExpression(value).valid, 'Use a cron expression, like "0 6 * * *".')
    .default('0 6 * * *'),
});
export type Env = z.infer<typeof envSchema>;

/** Parses the environment, failing fast with the name of every bad variable. */
export function validateEnv(raw: Record<string, unknown>): Env {
  const parsed = envSchema.safeParse(raw);
  if (parsed.success) {
    if (parsed.data.NODE_ENV === 'production' && !parsed.data.SESSION_SECRET) {
      throw new Error('Configuration error: SESSION_SECRET is required in production.');
    }
    return parsed.data;
  }
  const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
  throw new Error(`Configuration error:\n${lines.join('\n')}`);
}
