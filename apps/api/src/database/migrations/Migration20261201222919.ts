import { Migration } from '@mikro-orm/migrations';

/** Written by hand: the session store's table and the append-only rule for the audit log. */
export class Migration20261201222919 extends Migration {
  override async up(): Promise<void> {
    // connect-pg-simple's own table definition (its table.sql), kept out of the ORM's schema diff.
    this.addSql(
      `create table "session" ("sid" varchar not null collate "default", "sess" json not null, "expire" timestamp(6) not null, constraint "session_pkey" primary key ("sid"));`,
    );
    this.addSql(`create index "session_expire_index" on "session" ("expire");`);

    // Audit entries are evidence: the database itself refuses to change or remove one.
    this.addSql(`create function refuse_change() returns trigger language plpgsql as $$
      begin
        raise exception 'rows of % are permanent and cannot be %', TG_TABLE_NAME, lower(TG_OP)
          using errcode = 'integrity_constraint_violation';
      end $$;`);
    this.addSql(
      `create trigger audit_entry_is_permanent before update or delete on "audit_entry" for each row execute function refuse_change();`,
    );
    this.addSql(
      `create trigger audit_entry_no_truncate before truncate on "audit_entry" for each statement execute function refuse_change();`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop trigger audit_entry_no_truncate on "audit_entry";`);
    this.addSql(`drop trigger audit_entry_is_permanent on "audit_entry";`);
    this.addSql(`drop function refuse_change();`);
    this.addSql(`drop table "session";`);
  }
}
