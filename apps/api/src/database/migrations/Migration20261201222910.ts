import { Migration } from '@mikro-orm/migrations';

export class Migration20261201222910 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "audit_entry" ("id" uuid not null, "created_at" timestamptz not null default now(), "actor_id" uuid null, "actor_name" text not null, "action" text not null, "subject_type" text not null, "subject_id" text not null, "before" jsonb null, "after" jsonb null, "reason" text null, constraint "audit_entry_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "audit_entry_action_index" on "audit_entry" ("action");`);
    this.addSql(
      `create index "audit_entry_subject_type_subject_id_index" on "audit_entry" ("subject_type", "subject_id");`,
    );

    this.addSql(
      `create table "app_user" ("id" uuid not null, "created_at" timestamptz not null default now(), "email" text not null, "display_name" text not null, "password_hash" text not null, "roles" text[] not null, "active" boolean not null default true, "display_unit" text not null default 'in', "updated_at" timestamptz not null default now(), constraint "app_user_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "app_user" add constraint "app_user_email_unique" unique ("email");`);
  }
}
