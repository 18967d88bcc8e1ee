import { DynamicModule, Global, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { AppConfig } from './app-config.service';
import { validateEnv } from './env.schema';

/** Reads the environment when the app is built (not when this file loads), so tests can set it first. */
@Global()
@Module({})
export class AppConfigModule {
  static forRoot(): DynamicModule {
    return {
      module: AppConfigModule,
      imports: [
        ConfigModule.forRoot({
          isGlobal: true,
          validate: validateEnv,
          ignoreEnvFile: true,
        }),
      ],
      providers: [AppConfig],
      exports: [AppConfig],
    };
  }
}
