import { CreateRequestContext, EntityManager } from '@mikro-orm/postgresql';
import { Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import type { SessionUser } from '@evenset/contracts';
import { emailSchema, newPasswordSchema } from '@evenset/contracts';
import { AppConfig } from '../config/app-config.service';
import { User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import { UNKNOWN_USER_HASH, verifyPassword } from './password';

export function toSessionUser(user: User): SessionUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    roles: [...user.roles],
    displayUnit: user.displayUnit,
  };
}

const SESSION_USER_SQL = `
  select id, email, display_name as "displayName", roles, display_unit as "displayUnit"
    from app_user where id = ? and active`;

@Injectable()
export class AuthService implements OnApplicationBootstrap {
  private readonly logger = new Logger(AuthService.name);

  constructor(
    private readonly em: EntityManager,
    private readonly users: UsersService,
    private readonly config: AppConfig,
  ) {}

  /** The person behind these credentials, or null; unknown and inactive accounts answer alike. */
  async checkCredentials(email: string, password: string): Promise<SessionUser | null> {
    const user = await this.em
      .fork()
      .findOne(User, { email: email.trim().toLowerCase() }, { populate: ['passwordHash'] });
    const matches = await verifyPassword(password, user?.passwordHash ?? UNKNOWN_USER_HASH);
    return user && user.active && matches ? toSessionUser(user) : null;
  }

  /**
   * The session's person as stored now: a deactivated account loses its sessions at once. Read on
   * every signed-in request, so as one plain row rather than through the unit of work.
   */
  async sessionUser(id: string): Promise<SessionUser | null> {
    const [user] = await this.em.getConnection().execute<SessionUser[]>(SESSION_USER_SQL, [id]);
    return user ?? null;
  }

  /** Creates the first admin from EVENSET_ADMIN_EMAIL / EVENSET_ADMIN_PASSWORD when none exists. */
  @CreateRequestContext() // runs at start, outside any request's unit of work
  async onApplicationBootstrap(): Promise<void> {
    const email = this.config.get('EVENSET_ADMIN_EMAIL');
    const password = this.config.get('EVENSET_ADMIN_PASSWORD');
    if (!email || !password) return;
    const admins = await this.em.count(User, {
      roles: { $contains: ['admin'] },
      active: true,
    });
    if (admins > 0) return;
    await this.users.create(null, {
      email: emailSchema.parse(email),
      displayName: 'Administrator',
      roles: ['admin'],
      password: newPasswordSchema.parse(password),
    });
    this.logger.log(`Created the first admin account ${email}`);
  }
}
