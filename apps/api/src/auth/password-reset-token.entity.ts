import { Entity, ManyToOne, Property, Unique } from '@mikro-orm/core';
import { BaseEntity } from '../database/base.entity';
import { User } from '../users/user.entity';

/**
 * A single-use password reset. Only the token's SHA-256 is stored; `usedAt` is written once,
 * when the token is spent.
 */
@Entity({ tableName: 'password_reset_token' })
export class PasswordResetToken extends BaseEntity {
  @ManyToOne(() => User)
  user!: User;

  @Property({ type: 'text' })
  @Unique()
  tokenHash!: string;

  @Property({ type: 'timestamptz' })
  expiresAt!: Date;

  @Property({ type: 'timestamptz', nullable: true })
  usedAt: Date | null = null;
}
