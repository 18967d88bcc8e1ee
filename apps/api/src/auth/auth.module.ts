import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { AppConfig } from '../config/app-config.service';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { LocalStrategy } from './local.strategy';
import { PasswordResetController } from './password-reset.controller';
import { PasswordResetService } from './password-reset.service';
import { SessionSerializer } from './session.serializer';

@Module({
  imports: [
    UsersModule,
    MailModule,
    PassportModule.register({ session: true }),
    ThrottlerModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => [
        {
          name: 'login',
          limit: config.get('LOGIN_THROTTLE_LIMIT'),
          ttl: config.get('LOGIN_THROTTLE_TTL_SECONDS') * 1000,
        },
      ],
    }),
  ],
  controllers: [AuthController, PasswordResetController],
  providers: [AuthService, LocalStrategy, SessionSerializer, PasswordResetService],
})
export class AuthModule {}
