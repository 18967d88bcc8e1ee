import { Migration } from '@mikro-orm/migrations';

/**
 * part_current: each inspected part's current inspection (newest, not superseded) and the height of
 * its newest result. It is derived data, like an index: kept by a trigger on the insert of results,
 * read by trends so that years of lots need no `distinct on` over every inspection. The records stay
 * in inspection and inspection_result; this table can be rebuilt from them at any time.
 */
/** Every inspected part at once: the rule of PartStatusService in one pass. */
const BACKFILL = `
  insert into part_current (part_id, inspection_id, inspected_at, run_id, inspector_id, inspector_name, height_mm)
  select distinct on (c.part_id) c.part_id, c.id, c.created_at, c.run_id, c.inspector_id, c.inspector_name, x.height_mm
    from inspection c join inspection_result x on x.inspection_id = c.id
   where not exists (select 1 from inspection n where n.supersedes_id = c.id)
   order by c.part_id, c.created_at desc, c.id desc, x.created_at desc, x.id desc;`;

export class Migration20261202073000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(`create table "part_current" (
      "part_id" uuid not null references "part" ("id"),
      "inspection_id" uuid not null references "inspection" ("id"),
      "inspected_at" timestamptz not null,
      "run_id" uuid not null references "bench_run" ("id"),
      "inspector_id" uuid null,
      "inspector_name" text not null,
      "height_mm" numeric(12,7) not null,
      constraint "part_current_pkey" primary key ("part_id"));`);

    // Statement-level, so an import of thousands of results recomputes its parts in one statement,
    // part by part through the indexes (a plan that holds however stale the statistics are). The
    // parts are locked first, in id order: a save running beside this one for the same part waits,
    // then recomputes with this one's rows committed, so the last to write sees both.
    this.addSql(`create function keep_part_current() returns trigger language plpgsql as $$
      begin
        perform 1 from part
         where id in (select i.part_id from new_results r join inspection i on i.id = r.inspection_id)
         order by id for no key update;
        insert into part_current (part_id, inspection_id, inspected_at, run_id, inspector_id, inspector_name, height_mm)
        select t.part_id, cur.id, cur.created_at, cur.run_id, cur.inspector_id, cur.inspector_name, cur.height_mm
          from (select distinct i.part_id from new_results r join inspection i on i.id = r.inspection_id) t
         cross join lateral (
           select c.id, c.created_at, c.run_id, c.inspector_id, c.inspector_name, x.height_mm
             from inspection c join inspection_result x on x.inspection_id = c.id
            where c.part_id = t.part_id and not exists (select 1 from inspection n where n.supersedes_id = c.id)
            order by c.created_at desc, c.id desc, x.created_at desc, x.id desc
            limit 1) cur
        on conflict (part_id) do update set
          inspection_id = excluded.inspection_id, inspected_at = excluded.inspected_at, run_id = excluded.run_id,
          inspector_id = excluded.inspector_id, inspector_name = excluded.inspector_name, height_mm = excluded.height_mm;
        return null;
      end $$;`);
    this.addSql(`create trigger inspection_result_keeps_part_current after insert on "inspection_result"
      referencing new table as new_results for each statement execute function keep_part_current();`);

    this.addSql(BACKFILL);
  }

  override async down(): Promise<void> {
    this.addSql(`drop trigger inspection_result_keeps_part_current on "inspection_result";`);
    this.addSql(`drop function keep_part_current();`);
    this.addSql(`drop table "part_current";`);
  }
}
