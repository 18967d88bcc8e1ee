import { Migration } from '@mikro-orm/migrations';

/**
 * Lots, parts, dispositions, Bench runs, inspections with their readings and results, and the
 * spec's frozen expansion coefficient. Generated; the diff's spurious lines (session table,
 * hand-made indexes and checks read back from the database) removed by review; the backfill and
 * the append-only triggers written by hand.
 */
export class Migration20261201233300 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "lot" ("id" uuid not null, "created_at" timestamptz not null default now(), "lot_number" text not null, "spec_id" uuid not null, "quantity" int not null, "grind_date" date not null, "notes" text null, "created_by_id" uuid null, constraint "lot_pkey" primary key ("id"), constraint lot_quantity_check check (quantity >= 1));`,
    );
    this.addSql(`alter table "lot" add constraint "lot_lot_number_unique" unique ("lot_number");`);
    this.addSql(
      `create table "part" ("id" uuid not null, "created_at" timestamptz not null default now(), "lot_id" uuid not null, "part_number" text not null, "serial" text not null, constraint "part_pkey" primary key ("id"));`,
    );
    this.addSql(`create index "part_lot_id_index" on "part" ("lot_id");`);
    this.addSql(`alter table "part" add constraint "part_part_number_serial_unique" unique ("part_number", "serial");`);
    this.addSql(
      `create table "part_disposition" ("id" uuid not null, "created_at" timestamptz not null default now(), "part_id" uuid not null, "kind" text not null, "reason" text null, "inspection_id" uuid null, "current_height_mm" numeric(12,7) null, "target_height_mm" numeric(12,7) null, "stock_mm" numeric(12,7) null, "passes" jsonb null, "decided_by_id" uuid null, "decided_by_name" text not null, constraint "part_disposition_pkey" primary key ("id"), constraint part_disposition_kind_check check (kind in ('rework', 'scrap', 'use-as-is', 'release') and (kind not in ('scrap', 'use-as-is') or reason is not null) and ((kind = 'rework') = (target_height_mm is not null))));`,
    );
    this.addSql(
      `create index "part_disposition_part_id_created_at_index" on "part_disposition" ("part_id", "created_at");`,
    );
    this.addSql(
      `create table "bench_run" ("id" uuid not null, "created_at" timestamptz not null default now(), "lot_id" uuid not null, "master_id" uuid not null, "master_calibration_id" uuid not null, "instrument_id" uuid not null, "inspector_id" uuid null, "inspector_name" text not null, "master_temperature_c" numeric(5,2) not null, "part_temperature_c" numeric(5,2) not null, "master_start_reading_mm" numeric(12,7) not null, "master_end_reading_mm" numeric(12,7) null, "drift_limit_mm" numeric(12,7) not null, "ended_at" timestamptz null, constraint "bench_run_pkey" primary key ("id"), constraint bench_run_values_check check (master_temperature_c between 0 and 50 and part_temperature_c between 0 and 50 and drift_limit_mm > 0 and (ended_at is null) = (master_end_reading_mm is null)));`,
    );
    this.addSql(`create index "bench_run_lot_id_index" on "bench_run" ("lot_id");`);
    this.addSql(
      `create table "inspection" ("id" uuid not null, "created_at" timestamptz not null default now(), "part_id" uuid not null, "run_id" uuid not null, "spec_id" uuid not null, "master_calibration_id" uuid not null, "instrument_id" uuid not null, "instrument_resolution_mm" numeric(12,7) not null, "master_reading_mm" numeric(12,7) not null, "master_temperature_c" numeric(5,2) not null, "part_temperature_c" numeric(5,2) not null, "part_expansion_per_k" numeric(6,2) not null, "master_expansion_per_k" numeric(6,2) not null, "inspector_id" uuid null, "inspector_name" text not null, "supersedes_id" uuid null, "reason" text null, constraint "inspection_pkey" primary key ("id"), constraint inspection_correction_check check ((supersedes_id is null) = (reason is null)));`,
    );
    this.addSql(`create index "inspection_run_id_index" on "inspection" ("run_id");`);
    this.addSql(`alter table "inspection" add constraint "inspection_supersedes_id_unique" unique ("supersedes_id");`);
    this.addSql(`create index "inspection_part_id_created_at_index" on "inspection" ("part_id", "created_at");`);
    this.addSql(
      `create table "inspection_result" ("id" uuid not null, "created_at" timestamptz not null default now(), "inspection_id" uuid not null, "reason" text not null, "master_calibration_id" uuid not null, "height_mm" numeric(12,7) not null, "expanded_uncertainty_mm" numeric(12,7) not null, "flatness_mm" numeric(12,7) null, "parallelism_mm" numeric(12,7) null, "runout_mm" numeric(12,7) null, "verdict" text not null, "computed" jsonb not null, constraint "inspection_result_pkey" primary key ("id"), constraint inspection_result_verdict_check check (verdict in ('conforms', 'does-not-conform', 'guard-band') and expanded_uncertainty_mm >= 0));`,
    );
    this.addSql(
      `create index "inspection_result_master_calibration_id_index" on "inspection_result" ("master_calibration_id");`,
    );
    this.addSql(
      `create index "inspection_result_inspection_id_created_at_index" on "inspection_result" ("inspection_id", "created_at");`,
    );
    this.addSql(
      `create table "inspection_reading" ("id" uuid not null, "created_at" timestamptz not null default now(), "inspection_id" uuid not null, "position" int not null, "station" text not null, "kind" text not null, "reading_mm" numeric(12,7) not null, constraint "inspection_reading_pkey" primary key ("id"), constraint inspection_reading_kind_check check (kind in ('top', 'datum', 'runout')));`,
    );
    this.addSql(`create index "inspection_reading_inspection_id_index" on "inspection_reading" ("inspection_id");`);
    this.addSql(
      `alter table "lot" add constraint "lot_spec_id_foreign" foreign key ("spec_id") references "part_spec" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "part" add constraint "part_lot_id_foreign" foreign key ("lot_id") references "lot" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "part_disposition" add constraint "part_disposition_part_id_foreign" foreign key ("part_id") references "part" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "bench_run" add constraint "bench_run_lot_id_foreign" foreign key ("lot_id") references "lot" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "bench_run" add constraint "bench_run_master_id_foreign" foreign key ("master_id") references "master_gauge" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "bench_run" add constraint "bench_run_master_calibration_id_foreign" foreign key ("master_calibration_id") references "master_calibration" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "bench_run" add constraint "bench_run_instrument_id_foreign" foreign key ("instrument_id") references "instrument" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection" add constraint "inspection_part_id_foreign" foreign key ("part_id") references "part" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection" add constraint "inspection_run_id_foreign" foreign key ("run_id") references "bench_run" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection" add constraint "inspection_spec_id_foreign" foreign key ("spec_id") references "part_spec" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection" add constraint "inspection_master_calibration_id_foreign" foreign key ("master_calibration_id") references "master_calibration" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection" add constraint "inspection_supersedes_id_foreign" foreign key ("supersedes_id") references "inspection" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "inspection_result" add constraint "inspection_result_inspection_id_foreign" foreign key ("inspection_id") references "inspection" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection_result" add constraint "inspection_result_master_calibration_id_foreign" foreign key ("master_calibration_id") references "master_calibration" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "inspection_reading" add constraint "inspection_reading_inspection_id_foreign" foreign key ("inspection_id") references "inspection" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "part_spec" add column "frozen_expansion_per_k" numeric(6,2) null, add column "frozen_expansion_source" text null;`,
    );

    // Released revisions made before this migration take the coefficient their material has now.
    this.addSql(
      `update "part_spec" s set "frozen_expansion_per_k" = m."expansion_per_k", "frozen_expansion_source" = m."source" from "material" m where m."id" = s."material_id" and s."status" <> 'draft';`,
    );

    // Inspections, their readings and results are permanent records: a correction or a
    // recomputation is a new row.
    for (const table of ['inspection', 'inspection_reading', 'inspection_result', 'part_disposition']) {
      this.addSql(
        `create trigger ${table}_is_permanent before update or delete on "${table}" for each row execute function refuse_change();`,
      );
      this.addSql(
        `create trigger ${table}_no_truncate before truncate on "${table}" for each statement execute function refuse_change();`,
      );
    }
  }

  override async down(): Promise<void> {
    for (const table of [
      'inspection_reading',
      'inspection_result',
      'inspection',
      'bench_run',
      'part_disposition',
      'part',
      'lot',
    ])
      this.addSql(`drop table if exists "${table}" cascade;`);
    this.addSql(`alter table "part_spec" drop column "frozen_expansion_per_k", drop column "frozen_expansion_source";`);
  }
}
