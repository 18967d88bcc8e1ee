import { MikroOrmModule } from '@mikro-orm/nestjs';
import { PostgreSqlDriver } from '@mikro-orm/postgresql';
import { DynamicModule, Module, RequestMethod } from '@nestjs/common';
import { APP_FILTER, APP_GUARD, APP_PIPE } from '@nestjs/core';
import { ScheduleModule } from '@nestjs/schedule';
import { ServeStaticModule } from '@nestjs/serve-static';
import { LoggerModule } from 'nestjs-pino';
import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { CertificatesModule } from './certificates/certificates.module';
import { AccessGuard } from './common/auth/access.guard';
import { CsrfGuard } from './common/auth/csrf.guard';
import { AllExceptionsFilter } from './common/errors/all-exceptions.filter';
import { ContractValidationPipe } from './common/validation.pipe';
import { AppConfig } from './config/app-config.service';
import { AppConfigModule } from './config/config.module';
import { ormConfig } from './database/mikro-orm.config';
import { GaugeStudiesModule } from './gauge-studies/gauge-studies.module';
import { HealthModule } from './health/health.module';
import { HomeModule } from './home/home.module';
import { InspectionsModule } from './inspections/inspections.module';
import { InstrumentsModule } from './instruments/instruments.module';
import { CustomersModule } from './customers/customers.module';
import { LotsModule } from './lots/lots.module';
import { SetsModule } from './sets/sets.module';
import { ReplacementsModule } from './replacements/replacements.module';
import { MailModule } from './mail/mail.module';
import { MastersModule } from './masters/masters.module';
import { MaterialsModule } from './materials/materials.module';
import { SessionModule } from './session/session.module';
import { SpecsModule } from './specs/specs.module';
import { TrendsModule } from './trends/trends.module';
import { UsersModule } from './users/users.module';

const DEFAULT_WEB_DIST = join(__dirname, '../../web/dist');

/** The whole app, assembled when it is built so that the environment of that moment applies. */
@Module({})
export class AppModule {
  static forRoot(): DynamicModule {
    const webDist = process.env.WEB_DIST ?? DEFAULT_WEB_DIST;
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(),
        LoggerModule.forRootAsync({
          inject: [AppConfig],
          useFactory: (config: AppConfig) => ({
            forRoutes: [{ path: '{*path}', method: RequestMethod.ALL }],
            pinoHttp: {
              level: config.get('LOG_LEVEL'),
              genReqId: (req, res) => {
                const id = randomUUID();
                res.setHeader('x-request-id', id);
                return id;
              },
              redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'],
              // Refusals (4xx) are the product working as designed; only server faults are errors.
              customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : 'info'),
            },
          }),
        }),
        MikroOrmModule.forRootAsync({
          inject: [AppConfig],
          useFactory: (config: AppConfig) => ({
            ...ormConfig(config.get('DATABASE_URL')),
            forRoutesPath: '{*path}',
          }),
          driver: PostgreSqlDriver,
        }),
        // The built web app, same origin as the API; unknown paths fall back to index.html.
        ...(existsSync(webDist)
          ? [
              ServeStaticModule.forRoot({
                rootPath: webDist,
                exclude: ['/api/{*rest}'],
              }),
            ]
          : []),
        ScheduleModule.forRoot(),
        SessionModule,
        AuditModule,
        MailModule,
        AuthModule,
        UsersModule,
        MaterialsModule,
        SpecsModule,
        MastersModule,
        InstrumentsModule,
        LotsModule,
        InspectionsModule,
        CustomersModule,
        SetsModule,
        CertificatesModule,
        ReplacementsModule,
        TrendsModule,
        HomeModule,
        GaugeStudiesModule,
        HealthModule,
      ],
      providers: [
        { provide: APP_GUARD, useClass: AccessGuard },
        { provide: APP_GUARD, useClass: CsrfGuard },
        { provide: APP_PIPE, useClass: ContractValidationPipe },
        { provide: APP_FILTER, useClass: AllExceptionsFilter },
      ],
    };
  }
}
