import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import type { SessionUser } from '@evenset/contracts';
import { Strategy } from 'passport-local';
import { InvalidCredentialsException } from './auth.exception';
import { AuthService } from './auth.service';

@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(private readonly auth: AuthService) {
    super({ usernameField: 'email', passwordField: 'password' });
  }

  async validate(email: string, password: string): Promise<SessionUser> {
    const user = await this.auth.checkCredentials(email, password);
    if (!user) throw new InvalidCredentialsException();
    return user;
  }
}
