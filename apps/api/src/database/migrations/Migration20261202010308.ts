import { Migration } from '@mikro-orm/migrations';

/**
 * Customers and orders, matched sets and their members, certificates and revocations, the mail
 * outbox with its attempts and the SMTP sink's captures, password reset tokens, grind requests.
 * Generated; the append-only triggers written by hand.
 */
export class Migration20261202010308 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "captured_mail" ("id" uuid not null, "created_at" timestamptz not null default now(), "envelope_from" text not null, "envelope_to" text[] not null, "subject" text not null, "raw" bytea not null, constraint "captured_mail_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "captured_mail_created_at_index" on "captured_mail" ("created_at");`);

    this.addSql(
      `create table "customer" ("id" uuid not null, "created_at" timestamptz not null default now(), "name" text not null, "contact_email" text not null, "notes" text null, "created_by_id" uuid null, constraint "customer_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "customer" add constraint "customer_name_unique" unique ("name");`);

    this.addSql(
      `create table "customer_order" ("id" uuid not null, "created_at" timestamptz not null default now(), "customer_id" uuid not null, "reference" text not null, "notes" text null, "created_by_id" uuid null, constraint "customer_order_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "customer_order" add constraint "customer_order_customer_id_reference_unique" unique ("customer_id", "reference");`,
    );

    this.addSql(
      `create table "mail_message" ("id" uuid not null, "created_at" timestamptz not null default now(), "kind" text not null, "recipient" text not null, "subject" text not null, "body" text not null, "subject_id" uuid null, "requested_by_id" uuid null, constraint "mail_message_pkey" primary key ("id"), constraint mail_message_kind_check check (kind in ('certificate', 'password-reset', 'digest')));`,
    );
    this.addSql(`create index "mail_message_subject_id_index" on "mail_message" ("subject_id");`);
    this.addSql(`create index "mail_message_created_at_index" on "mail_message" ("created_at");`);

    this.addSql(
      `create table "mail_attempt" ("id" uuid not null, "created_at" timestamptz not null default now(), "message_id" uuid not null, "outcome" text not null, "error" text null, "server_response" text null, constraint "mail_attempt_pkey" primary key ("id"), constraint mail_attempt_outcome_check check (outcome in ('sent', 'failed') and ((outcome = 'failed') = (error is not null))));`,
    );
    this.addSql(
      `create index "mail_attempt_message_id_created_at_index" on "mail_attempt" ("message_id", "created_at");`,
    );

    this.addSql(
      `create table "mail_attachment" ("id" uuid not null, "created_at" timestamptz not null default now(), "message_id" uuid not null, "filename" text not null, "content_type" text not null, "content" bytea not null, constraint "mail_attachment_pkey" primary key ("id"));`,
    );

    this.addSql(
      `create table "matched_set" ("id" uuid not null, "created_at" timestamptz not null default now(), "set_number" text not null, "order_id" uuid not null, "part_number" text not null, "kind" text not null, "replaces_set_id" uuid null, "matching_band_mm" numeric(12,7) not null, "allocated_by_id" uuid null, "allocated_by_name" text not null, constraint "matched_set_pkey" primary key ("id"), constraint matched_set_kind_check check (kind in ('set', 'replacement') and ((kind = 'replacement') = (replaces_set_id is not null)) and matching_band_mm > 0));`,
    );
    this.addSql(`alter table "matched_set" add constraint "matched_set_set_number_unique" unique ("set_number");`);
    this.addSql(`create index "matched_set_order_id_index" on "matched_set" ("order_id");`);
    this.addSql(`create index "matched_set_part_number_kind_index" on "matched_set" ("part_number", "kind");`);

    this.addSql(
      `create table "certificate" ("id" uuid not null, "created_at" timestamptz not null default now(), "certificate_number" text not null, "verification_code" text not null, "set_id" uuid not null, "payload" text not null, "signature" text not null, "key_id" text not null, "issued_by_id" uuid null, "issued_by_name" text not null, constraint "certificate_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "certificate" add constraint "certificate_certificate_number_unique" unique ("certificate_number");`,
    );
    this.addSql(
      `alter table "certificate" add constraint "certificate_verification_code_unique" unique ("verification_code");`,
    );
    this.addSql(`create index "certificate_set_id_index" on "certificate" ("set_id");`);

    this.addSql(
      `create table "certificate_revocation" ("id" uuid not null, "created_at" timestamptz not null default now(), "certificate_id" uuid not null, "reason" text not null, "revoked_by_id" uuid null, "revoked_by_name" text not null, constraint "certificate_revocation_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "certificate_revocation" add constraint "certificate_revocation_certificate_id_unique" unique ("certificate_id");`,
    );

    this.addSql(
      `create table "grind_request" ("id" uuid not null, "created_at" timestamptz not null default now(), "request_number" text not null, "part_id" uuid not null, "original_set_id" uuid not null, "current_height_mm" numeric(12,7) not null, "target_height_mm" numeric(12,7) not null, "stock_mm" numeric(12,7) not null, "window_low_mm" numeric(12,7) not null, "window_high_mm" numeric(12,7) not null, "passes" jsonb not null, "requested_by_id" uuid null, "requested_by_name" text not null, constraint "grind_request_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "grind_request" add constraint "grind_request_request_number_unique" unique ("request_number");`,
    );

    this.addSql(
      `create table "grind_request_step" ("id" uuid not null, "created_at" timestamptz not null default now(), "request_id" uuid not null, "status" text not null, "note" text null, "inspection_id" uuid null, "recorded_by_id" uuid null, "recorded_by_name" text not null, constraint "grind_request_step_pkey" primary key ("id"), constraint grind_request_step_status_check check (status in ('open', 'ground', 're-inspected')));`,
    );
    this.addSql(
      `create index "grind_request_step_request_id_created_at_index" on "grind_request_step" ("request_id", "created_at");`,
    );

    this.addSql(
      `create table "set_member" ("id" uuid not null, "created_at" timestamptz not null default now(), "set_id" uuid not null, "part_id" uuid not null, "position" int not null, "result_id" uuid not null, "height_mm" numeric(12,7) not null, constraint "set_member_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "set_member" add constraint "set_member_part_id_unique" unique ("part_id");`);
    this.addSql(
      `alter table "set_member" add constraint "set_member_set_id_position_unique" unique ("set_id", "position");`,
    );

    this.addSql(
      `create table "password_reset_token" ("id" uuid not null, "created_at" timestamptz not null default now(), "user_id" uuid not null, "token_hash" text not null, "expires_at" timestamptz not null, "used_at" timestamptz null, constraint "password_reset_token_pkey" primary key ("id"));`,
    );
    this.addSql(
      `alter table "password_reset_token" add constraint "password_reset_token_token_hash_unique" unique ("token_hash");`,
    );

    this.addSql(
      `alter table "customer_order" add constraint "customer_order_customer_id_foreign" foreign key ("customer_id") references "customer" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "mail_attempt" add constraint "mail_attempt_message_id_foreign" foreign key ("message_id") references "mail_message" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "mail_attachment" add constraint "mail_attachment_message_id_foreign" foreign key ("message_id") references "mail_message" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "matched_set" add constraint "matched_set_order_id_foreign" foreign key ("order_id") references "customer_order" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "matched_set" add constraint "matched_set_replaces_set_id_foreign" foreign key ("replaces_set_id") references "matched_set" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "certificate" add constraint "certificate_set_id_foreign" foreign key ("set_id") references "matched_set" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "certificate_revocation" add constraint "certificate_revocation_certificate_id_foreign" foreign key ("certificate_id") references "certificate" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "grind_request" add constraint "grind_request_part_id_foreign" foreign key ("part_id") references "part" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "grind_request" add constraint "grind_request_original_set_id_foreign" foreign key ("original_set_id") references "matched_set" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "grind_request_step" add constraint "grind_request_step_request_id_foreign" foreign key ("request_id") references "grind_request" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "set_member" add constraint "set_member_set_id_foreign" foreign key ("set_id") references "matched_set" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "set_member" add constraint "set_member_part_id_foreign" foreign key ("part_id") references "part" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "set_member" add constraint "set_member_result_id_foreign" foreign key ("result_id") references "inspection_result" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "password_reset_token" add constraint "password_reset_token_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade;`,
    );

    // Sets, certificates, mail and grind requests are permanent records: a change is a new row.
    for (const table of [
      'matched_set',
      'set_member',
      'certificate',
      'certificate_revocation',
      'mail_message',
      'mail_attachment',
      'mail_attempt',
      'grind_request',
      'grind_request_step',
    ]) {
      this.addSql(
        `create trigger ${table}_is_permanent before update or delete on "${table}" for each row execute function refuse_change();`,
      );
      this.addSql(
        `create trigger ${table}_no_truncate before truncate on "${table}" for each statement execute function refuse_change();`,
      );
    }
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "customer_order" drop constraint "customer_order_customer_id_foreign";`);

    this.addSql(`alter table "matched_set" drop constraint "matched_set_order_id_foreign";`);

    this.addSql(`alter table "mail_attempt" drop constraint "mail_attempt_message_id_foreign";`);

    this.addSql(`alter table "mail_attachment" drop constraint "mail_attachment_message_id_foreign";`);

    this.addSql(`alter table "matched_set" drop constraint "matched_set_replaces_set_id_foreign";`);

    this.addSql(`alter table "certificate" drop constraint "certificate_set_id_foreign";`);

    this.addSql(`alter table "grind_request" drop constraint "grind_request_original_set_id_foreign";`);

    this.addSql(`alter table "set_member" drop constraint "set_member_set_id_foreign";`);

    this.addSql(
      `alter table "certificate_revocation" drop constraint "certificate_revocation_certificate_id_foreign";`,
    );

    this.addSql(`alter table "grind_request_step" drop constraint "grind_request_step_request_id_foreign";`);

    this.addSql(`drop table if exists "captured_mail" cascade;`);

    this.addSql(`drop table if exists "customer" cascade;`);

    this.addSql(`drop table if exists "customer_order" cascade;`);

    this.addSql(`drop table if exists "mail_message" cascade;`);

    this.addSql(`drop table if exists "mail_attempt" cascade;`);

    this.addSql(`drop table if exists "mail_attachment" cascade;`);

    this.addSql(`drop table if exists "matched_set" cascade;`);

    this.addSql(`drop table if exists "certificate" cascade;`);

    this.addSql(`drop table if exists "certificate_revocation" cascade;`);

    this.addSql(`drop table if exists "grind_request" cascade;`);

    this.addSql(`drop table if exists "grind_request_step" cascade;`);

    this.addSql(`drop table if exists "set_member" cascade;`);

    this.addSql(`drop table if exists "password_reset_token" cascade;`);
  }
}
