import { Entity, Property, Unique } from '@mikro-orm/core';
import type { DisplayUnit, Role, User as UserView } from '@evenset/contracts';
import { BaseEntity } from '../database/base.entity';

@Entity({ tableName: 'app_user' })
export class User extends BaseEntity {
  @Property({ type: 'text' })
  @Unique()
  email!: string;

  @Property({ type: 'text' })
  displayName!: string;

  @Property({ type: 'text', hidden: true, lazy: true })
  passwordHash!: string;

  @Property({ type: 'text[]' })
  roles: Role[] = [];

  @Property({ type: 'boolean' })
  active: boolean = true;

  @Property({ type: 'text' })
  displayUnit: DisplayUnit = 'in';

  @Property({
    type: 'timestamptz',
    onUpdate: () => new Date(),
    defaultRaw: 'now()',
  })
  updatedAt: Date = new Date();

  toView(): UserView {
    return {
      id: this.id,
      email: this.email,
      displayName: this.displayName,
      roles: [...this.roles],
      active: this.active,
      displayUnit: this.displayUnit,
      createdAt: this.createdAt.toISOString(),
    };
  }
}
