import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import { ormConfig } from './mikro-orm.config';
import { DemoSeeder } from './seeders/demo.seeder';

/** `node dist/database/cli.js migrate|seed` — run by the bootstrap scripts, never at app start. */
async function main(command: string | undefined): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('Set DATABASE_URL.');
  const config = ormConfig(url);
  // The snapshot belongs to `migration:create`; applying migrations must not rewrite the source tree.
  const orm = await MikroORM.init({ ...config, migrations: { ...config.migrations, snapshot: false }, debug: false });
  try {
    if (command === 'migrate') {
      const applied = await orm.getMigrator().up();
      console.log(applied.length ? `  applied: ${applied.map((m) => m.name).join(', ')}` : '  no pending migrations');
    } else if (command === 'seed') {
      await orm.getSeeder().seed(DemoSeeder);
    } else {
      throw new Error(`Unknown command "${command ?? ''}": use migrate or seed.`);
    }
  } finally {
    await orm.close(true);
  }
}

main(process.argv[2]).catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
