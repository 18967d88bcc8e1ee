import { Migration } from '@mikro-orm/migrations';

/** Materials and part specs (generated, then the session-table drop removed: the snapshot had it). */
export class Migration20261201225338 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "material" ("id" uuid not null, "created_at" timestamptz not null default now(), "name" text not null, "expansion_per_k" numeric(6,2) not null, "source" text not null, "confidence" text not null, "updated_at" timestamptz not null default now(), constraint "material_pkey" primary key ("id"), constraint material_confidence_check check (confidence in ('firm', 'from memory')));`,
    );
    this.addSql(`alter table "material" add constraint "material_name_unique" unique ("name");`);

    this.addSql(
      `create table "part_spec" ("id" uuid not null, "created_at" timestamptz not null default now(), "part_number" text not null, "revision" text not null, "status" text not null default 'draft', "previous_id" uuid null, "title" text not null, "material_id" uuid not null, "display_unit" text not null, "nominal_mm" numeric(12,7) not null, "band_lower_mm" numeric(12,7) not null, "band_upper_mm" numeric(12,7) not null, "matching_band_mm" numeric(12,7) not null, "flatness_mm" numeric(12,7) null, "parallelism_mm" numeric(12,7) null, "runout_mm" numeric(12,7) null, "set_size" int not null, "height_statistic" text not null, "height_station" text null, "decision_rule" text not null, "rough_depth_mm" numeric(12,7) null, "finish_allowance_mm" numeric(12,7) null, "finish_depth_mm" numeric(12,7) null, "spark_out_passes" int null, "master_drift_limit_mm" numeric(12,7) null, "plan" jsonb not null, "released_at" timestamptz null, "released_by_id" uuid null, "updated_at" timestamptz not null default now(), constraint "part_spec_pkey" primary key ("id"), constraint part_spec_grinding_check check ((rough_depth_mm is null) = (finish_allowance_mm is null) and (rough_depth_mm is null) = (finish_depth_mm is null) and (rough_depth_mm is null) = (spark_out_passes is null)), constraint part_spec_height_check check ((height_statistic = 'station') = (height_station is not null)), constraint part_spec_lengths_check check (nominal_mm > 0 and matching_band_mm > 0 and set_size >= 1 and coalesce(flatness_mm, 1) > 0 and coalesce(parallelism_mm, 1) > 0 and coalesce(runout_mm, 1) > 0 and coalesce(master_drift_limit_mm, 1) > 0), constraint part_spec_band_check check (band_lower_mm < band_upper_mm), constraint part_spec_choices_check check (display_unit in ('in', 'mm') and height_statistic in ('mean', 'highest', 'station') and decision_rule in ('simple', 'guarded')), constraint part_spec_status_check check (status in ('draft', 'released', 'superseded')));`,
    );
    this.addSql(`create index "part_spec_part_number_index" on "part_spec" ("part_number");`);
    this.addSql(
      `alter table "part_spec" add constraint "part_spec_part_number_revision_unique" unique ("part_number", "revision");`,
    );

    this.addSql(
      `alter table "part_spec" add constraint "part_spec_previous_id_foreign" foreign key ("previous_id") references "part_spec" ("id") on update cascade on delete set null;`,
    );
    this.addSql(
      `alter table "part_spec" add constraint "part_spec_material_id_foreign" foreign key ("material_id") references "material" ("id") on update cascade;`,
    );

    // At most one draft and one released revision per part number, whatever the app does.
    this.addSql(`create unique index "part_spec_one_draft" on "part_spec" ("part_number") where status = 'draft';`);
    this.addSql(
      `create unique index "part_spec_one_released" on "part_spec" ("part_number") where status = 'released';`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "part_spec" drop constraint "part_spec_material_id_foreign";`);

    this.addSql(`alter table "part_spec" drop constraint "part_spec_previous_id_foreign";`);

    this.addSql(`drop table if exists "material" cascade;`);

    this.addSql(`drop table if exists "part_spec" cascade;`);
  }
}
