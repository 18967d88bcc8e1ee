import type { EntityManager } from '@mikro-orm/postgresql';
import type { Role } from '@evenset/contracts';
import { hashPassword } from '../../auth/password';
import { User } from '../../users/user.entity';

export interface UserSeed {
  email: string;
  displayName: string;
  roles: Role[];
  password: string;
  active?: boolean;
}

/** Creates a person, or returns the existing one with that e-mail (seeding is idempotent). */
export async function ensureUser(em: EntityManager, seed: UserSeed): Promise<User> {
  const existing = await em.findOne(User, { email: seed.email });
  if (existing) return existing;
  const user = em.create(User, {
    email: seed.email,
    displayName: seed.displayName,
    roles: seed.roles,
    passwordHash: await hashPassword(seed.password),
    active: seed.active ?? true,
    displayUnit: 'in',
    createdAt: new Date(),
    updatedAt: new Date(),
  });
  em.persist(user);
  return user;
}
