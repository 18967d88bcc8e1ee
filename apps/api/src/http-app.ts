import { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import session from 'express-session';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { cleanupOpenApiDoc } from 'nestjs-zod';
import passport from 'passport';
import type { NextFunction, Request, Response } from 'express';
import { isDatabaseUnavailable } from './common/errors/database-errors';
import { DatabaseUnavailableException } from './common/errors/domain.exception';
import { randomBytes } from 'node:crypto';
import { AppModule } from './app.module';
import { AppConfig } from './config/app-config.service';
import { SessionPool } from './session/session-pool';
import { SessionStore } from './session/session-store';

const SESSION_MAX_AGE_MS = 12 * 60 * 60 * 1000; // one shift and some

/** Builds the HTTP app with every middleware in place; `main.ts` and the tests both use it. */
export async function createHttpApp(): Promise<INestApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(), {
    bufferLogs: true,
    abortOnError: false,
  });
  app.useLogger(app.get(Logger));
  const config = app.get(AppConfig);

  const trustProxy = config.get('TRUST_PROXY');
  if (trustProxy) app.set('trust proxy', /^\d+$/.test(trustProxy) ? Number(trustProxy) : trustProxy);
  app.setGlobalPrefix('api', { exclude: [] });
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // MUI/Emotion inject <style> tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.useBodyParser('json', { limit: '2mb' });

  const { pool } = app.get(SessionPool);
  const cookieSecure = config.get('COOKIE_SECURE');
  app.use(
    session({
      name: 'evenset.sid',
      store: new SessionStore(pool),
      secret: config.get('SESSION_SECRET') ?? randomBytes(32).toString('hex'),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        // 'auto': secure exactly when the request came over TLS (directly or via a trusted proxy).
        secure: cookieSecure ?? 'auto',
        maxAge: SESSION_MAX_AGE_MS,
      },
    }),
  );
  app.use(passport.initialize());
  app.use(passport.session());
  // Loading the session runs before Nest's exception filter: a database outage here would
  // otherwise fall through to a 404. Answer as the filter does for every other route.
  app.use((error: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (!isDatabaseUnavailable(error)) return next(error);
    const unavailable = new DatabaseUnavailableException();
    res.status(unavailable.status).json({ code: unavailable.code, message: unavailable.message });
  });
  app.enableShutdownHooks();

  const openApi = new DocumentBuilder()
    .setTitle('Evenset API')
    .setDescription('Inspection records, matched sets and certificates. Every route names the roles that may use it.')
    .setVersion('0.1.0')
    .addCookieAuth('evenset.sid')
    .build();
  SwaggerModule.setup('api/docs', app, () => cleanupOpenApiDoc(SwaggerModule.createDocument(app, openApi)));
  return app;
}
