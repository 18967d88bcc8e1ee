import { Migration } from '@mikro-orm/migrations';

/**
 * Master gauges, calibrations, certificates and instruments. Generated; the diff's spurious lines
 * (session table, hand-made indexes and checks read back from the database) removed by review.
 */
export class Migration20261201230229 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "calibration_certificate" ("id" uuid not null, "created_at" timestamptz not null default now(), "filename" text not null, "content_type" text not null, "size_bytes" int not null, "sha256" text not null, "content" bytea not null, constraint "calibration_certificate_pkey" primary key ("id"), constraint calibration_certificate_type_check check (content_type in ('application/pdf', 'image/png', 'image/jpeg') and size_bytes > 0));`,
    );

    this.addSql(
      `create table "instrument" ("id" uuid not null, "created_at" timestamptz not null default now(), "code" text not null, "kind" text not null, "description" text not null, "resolution_mm" numeric(12,7) not null, "calibration_due_on" date not null, "retired_at" timestamptz null, "retired_reason" text null, "updated_at" timestamptz not null default now(), constraint "instrument_pkey" primary key ("id"), constraint instrument_values_check check (kind in ('indicator', 'height-gauge', 'electronic-probe', 'other') and resolution_mm > 0));`,
    );
    this.addSql(`alter table "instrument" add constraint "instrument_code_unique" unique ("code");`);

    this.addSql(
      `create table "master_gauge" ("id" uuid not null, "created_at" timestamptz not null default now(), "code" text not null, "description" text not null, "nominal_mm" numeric(12,7) not null, "material_id" uuid not null, "current_calibration_id" uuid null, "retired_at" timestamptz null, "retired_reason" text null, "updated_at" timestamptz not null default now(), constraint "master_gauge_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "master_gauge" add constraint "master_gauge_code_unique" unique ("code");`);

    this.addSql(
      `create table "master_calibration" ("id" uuid not null, "created_at" timestamptz not null default now(), "master_id" uuid not null, "calibrated_on" date not null, "due_on" date not null, "calibrated_size_mm" numeric(12,7) not null, "expanded_uncertainty_mm" numeric(12,7) not null, "coverage_factor" numeric(4,2) not null, "certificate_number" text not null, "certificate_id" uuid not null, "supersedes_id" uuid null, "reason" text null, "recorded_by_id" uuid null, "recorded_by_name" text not null, constraint "master_calibration_pkey" primary key ("id"), constraint master_calibration_correction_check check ((supersedes_id is null) = (reason is null)), constraint master_calibration_values_check check (due_on > calibrated_on and calibrated_size_mm > 0 and expanded_uncertainty_mm > 0 and coverage_factor between 1 and 4));`,
    );
    this.addSql(
      `alter table "master_calibration" add constraint "master_calibration_certificate_id_unique" unique ("certificate_id");`,
    );
    this.addSql(
      `alter table "master_calibration" add constraint "master_calibration_supersedes_id_unique" unique ("supersedes_id");`,
    );

    this.addSql(
      `alter table "master_gauge" add constraint "master_gauge_material_id_foreign" foreign key ("material_id") references "material" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "master_gauge" add constraint "master_gauge_current_calibration_id_foreign" foreign key ("current_calibration_id") references "master_calibration" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "master_calibration" add constraint "master_calibration_master_id_foreign" foreign key ("master_id") references "master_gauge" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "master_calibration" add constraint "master_calibration_certificate_id_foreign" foreign key ("certificate_id") references "calibration_certificate" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "master_calibration" add constraint "master_calibration_supersedes_id_foreign" foreign key ("supersedes_id") references "master_calibration" ("id") on update cascade on delete set null;`,
    );

    // Calibrations and their certificates are permanent records: a correction is a new row.
    for (const table of ['master_calibration', 'calibration_certificate']) {
      this.addSql(
        `create trigger ${table}_is_permanent before update or delete on "${table}" for each row execute function refuse_change();`,
      );
      this.addSql(
        `create trigger ${table}_no_truncate before truncate on "${table}" for each statement execute function refuse_change();`,
      );
    }
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "master_calibration" drop constraint "master_calibration_certificate_id_foreign";`);

    this.addSql(`alter table "master_calibration" drop constraint "master_calibration_master_id_foreign";`);

    this.addSql(`alter table "master_gauge" drop constraint "master_gauge_current_calibration_id_foreign";`);

    this.addSql(`alter table "master_calibration" drop constraint "master_calibration_supersedes_id_foreign";`);

    this.addSql(`drop table if exists "calibration_certificate" cascade;`);

    this.addSql(`drop table if exists "instrument" cascade;`);

    this.addSql(`drop table if exists "master_gauge" cascade;`);

    this.addSql(`drop table if exists "master_calibration" cascade;`);
  }
}
