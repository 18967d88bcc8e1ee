import { Migration } from '@mikro-orm/migrations';

/**
 * Gauge studies: the study, its schedule (one slot per inspector, trial and part) and the
 * measurements. Generated; the one-measurement-per-slot index and the append-only triggers written
 * by hand.
 */
export class Migration20261202020000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "gauge_study" ("id" uuid not null, "created_at" timestamptz not null default now(), "name" text not null, "spec_id" uuid not null, "instrument_id" uuid not null, "master_id" uuid not null, "master_calibration_id" uuid not null, "trials" int not null, "seed" int not null, "created_by_id" uuid null, "created_by_name" text not null, constraint "gauge_study_pkey" primary key ("id"), constraint gauge_study_values_check check (trials between 2 and 5 and seed >= 0));`,
    );

    this.addSql(
      `create table "gauge_study_slot" ("id" uuid not null, "created_at" timestamptz not null default now(), "study_id" uuid not null, "part_id" uuid not null, "inspector_id" uuid not null, "inspector_name" text not null, "inspector_position" int not null, "trial" int not null, "sequence" int not null, constraint "gauge_study_slot_pkey" primary key ("id"), constraint gauge_study_slot_values_check check (trial >= 1 and sequence >= 1 and inspector_position >= 1));`,
    );
    this.addSql(`create index "gauge_study_slot_study_id_index" on "gauge_study_slot" ("study_id");`);
    this.addSql(`create index "gauge_study_slot_inspector_id_index" on "gauge_study_slot" ("inspector_id");`);
    this.addSql(
      `alter table "gauge_study_slot" add constraint "gauge_study_slot_study_id_inspector_id_trial_part_id_unique" unique ("study_id", "inspector_id", "trial", "part_id");`,
    );
    this.addSql(
      `alter table "gauge_study_slot" add constraint "gauge_study_slot_study_id_inspector_id_sequence_unique" unique ("study_id", "inspector_id", "sequence");`,
    );

    this.addSql(
      `create table "gauge_study_measurement" ("id" uuid not null, "created_at" timestamptz not null default now(), "slot_id" uuid not null, "reading_mm" numeric(12,7) not null, "height_mm" numeric(12,7) not null, "recorded_by_id" uuid null, "recorded_by_name" text not null, "supersedes_id" uuid null, "reason" text null, constraint "gauge_study_measurement_pkey" primary key ("id"), constraint gauge_study_measurement_correction_check check ((supersedes_id is null) = (reason is null)));`,
    );
    this.addSql(`create index "gauge_study_measurement_slot_id_index" on "gauge_study_measurement" ("slot_id");`);
    this.addSql(
      `alter table "gauge_study_measurement" add constraint "gauge_study_measurement_supersedes_id_unique" unique ("supersedes_id");`,
    );

    this.addSql(
      `alter table "gauge_study" add constraint "gauge_study_spec_id_foreign" foreign key ("spec_id") references "part_spec" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study" add constraint "gauge_study_instrument_id_foreign" foreign key ("instrument_id") references "instrument" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study" add constraint "gauge_study_master_id_foreign" foreign key ("master_id") references "master_gauge" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study" add constraint "gauge_study_master_calibration_id_foreign" foreign key ("master_calibration_id") references "master_calibration" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "gauge_study_slot" add constraint "gauge_study_slot_study_id_foreign" foreign key ("study_id") references "gauge_study" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study_slot" add constraint "gauge_study_slot_part_id_foreign" foreign key ("part_id") references "part" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study_slot" add constraint "gauge_study_slot_inspector_id_foreign" foreign key ("inspector_id") references "app_user" ("id") on update cascade;`,
    );

    this.addSql(
      `alter table "gauge_study_measurement" add constraint "gauge_study_measurement_slot_id_foreign" foreign key ("slot_id") references "gauge_study_slot" ("id") on update cascade;`,
    );
    this.addSql(
      `alter table "gauge_study_measurement" add constraint "gauge_study_measurement_supersedes_id_foreign" foreign key ("supersedes_id") references "gauge_study_measurement" ("id") on update cascade on delete set null;`,
    );

    // One first measurement per slot: a double Enter or two tabs cannot save a slot twice.
    this.addSql(
      `create unique index "gauge_study_measurement_first_per_slot" on "gauge_study_measurement" ("slot_id") where "supersedes_id" is null;`,
    );

    // Studies, schedules and measurements are permanent records: a correction is a new row.
    for (const table of ['gauge_study', 'gauge_study_slot', 'gauge_study_measurement']) {
      this.addSql(
        `create trigger ${table}_is_permanent before update or delete on "${table}" for each row execute function refuse_change();`,
      );
      this.addSql(
        `create trigger ${table}_no_truncate before truncate on "${table}" for each statement execute function refuse_change();`,
      );
    }
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "gauge_study_slot" drop constraint "gauge_study_slot_study_id_foreign";`);

    this.addSql(`alter table "gauge_study_measurement" drop constraint "gauge_study_measurement_slot_id_foreign";`);

    this.addSql(
      `alter table "gauge_study_measurement" drop constraint "gauge_study_measurement_supersedes_id_foreign";`,
    );

    this.addSql(`drop table if exists "gauge_study" cascade;`);

    this.addSql(`drop table if exists "gauge_study_slot" cascade;`);

    this.addSql(`drop table if exists "gauge_study_measurement" cascade;`);
  }
}
