import { Migration } from '@mikro-orm/migrations';

export class Migration20261202052335 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`drop index "inspection_result_inspection_id_created_at_index";`);

    this.addSql(`create index "inspection_result_current_height" on "inspection_result" ("inspection_id", "created_at", "id") include ("height_mm");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop index "inspection_result_current_height";`);

    this.addSql(`create index "inspection_result_inspection_id_created_at_index" on "inspection_result" ("inspection_id", "created_at");`);
  }

}
