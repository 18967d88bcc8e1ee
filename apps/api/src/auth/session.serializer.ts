import { Injectable } from '@nestjs/common';
import { PassportSerializer } from '@nestjs/passport';
import type { SessionUser } from '@evenset/contracts';
import { AuthService } from './auth.service';

type Done<T> = (error: unknown, value?: T | false | null) => void;

/** Only the id lives in the session; the person is read afresh on every request. */
@Injectable()
export class SessionSerializer extends PassportSerializer {
  constructor(private readonly auth: AuthService) {
    super();
  }

  serializeUser(user: SessionUser, done: Done<string>): void {
    done(null, user.id);
  }

  deserializeUser(id: string, done: Done<SessionUser>): void {
    this.auth.sessionUser(id).then(
      (user) => done(null, user ?? false),
      (error: unknown) => done(error),
    );
  }
}
