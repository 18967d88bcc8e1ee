import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import type {
  ChangeRolesInput,
  CreateUserInput,
  ListQuery,
  Page,
  SessionUser,
  User as UserView,
} from '@evenset/contracts';
import { AuditService } from '../audit/audit.service';
import { NotFoundException } from '../common/errors/domain.exception';
import { hashNewPassword } from '../auth/password';
import { listOptions, searchAny } from '../common/list-query';
import { SelfLockoutException, UserEmailTakenException } from './users.exception';
import { User } from './user.entity';

@Injectable()
export class UsersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(query: ListQuery): Promise<Page<UserView>> {
    const [users, total] = await this.em.findAndCount(
      User,
      searchAny<User>(query.q, ['email', 'displayName']),
      listOptions(query, ['email', 'displayName', 'createdAt'], 'displayName'),
    );
    return { items: users.map((u) => u.toView()), total };
  }

  async create(actor: SessionUser | null, input: CreateUserInput): Promise<UserView> {
    const user = this.em.create(User, {
      email: input.email,
      displayName: input.displayName,
      roles: input.roles,
      passwordHash: await hashNewPassword(input.password),
      active: true,
      displayUnit: 'in',
      createdAt: new Date(),
      updatedAt: new Date(),
    });
    this.em.persist(user);
    this.audit.record(actor, {
      action: 'user.create',
      subjectType: 'user',
      subjectId: user.id,
      after: summary(user),
    });
    try {
      await this.em.flush();
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw new UserEmailTakenException(input.email);
      throw error;
    }
    return user.toView();
  }

  async changeRoles(actor: SessionUser, id: string, input: ChangeRolesInput): Promise<UserView> {
    const user = await this.get(id);
    if (user.id === actor.id && !input.roles.includes('admin'))
      throw new SelfLockoutException('remove the admin role from');
    const before = summary(user);
    user.roles = [...input.roles];
    this.audit.record(actor, {
      action: 'user.roles',
      subjectType: 'user',
      subjectId: user.id,
      before,
      after: summary(user),
    });
    await this.em.flush();
    return user.toView();
  }

  async setActive(actor: SessionUser, id: string, active: boolean): Promise<UserView> {
    const user = await this.get(id);
    if (user.id === actor.id && !active) throw new SelfLockoutException('deactivate');
    const before = summary(user);
    user.active = active;
    this.audit.record(actor, {
      action: active ? 'user.reactivate' : 'user.deactivate',
      subjectType: 'user',
      subjectId: user.id,
      before,
      after: summary(user),
    });
    await this.em.flush();
    // A deactivated person is signed out everywhere at once: their stored sessions go too.
    if (!active)
      await this.em.getConnection().execute(`delete from "session" where sess->'passport'->>'user' = ?`, [user.id]);
    return user.toView();
  }

  async resetPassword(actor: SessionUser, id: string, password: string): Promise<void> {
    const user = await this.get(id);
    user.passwordHash = await hashNewPassword(password);
    this.audit.record(actor, {
      action: 'user.password-reset',
      subjectType: 'user',
      subjectId: user.id,
    });
    await this.em.flush();
  }

  private async get(id: string): Promise<User> {
    const user = await this.em.findOne(User, { id });
    if (!user) throw new NotFoundException('This person');
    return user;
  }
}

function summary(user: User): Record<string, unknown> {
  return {
    email: user.email,
    displayName: user.displayName,
    roles: [...user.roles],
    active: user.active,
  };
}
