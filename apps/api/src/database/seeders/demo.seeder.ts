import type { EntityManager } from '@mikro-orm/postgresql';
import { Seeder } from '@mikro-orm/seeder';
import { ensureUser } from '../factories/user.factory';
import { DEMO_PEOPLE } from './demo-people';

/** The invented demo scenario of brief.md. Safe to run again: it only adds what is missing. */
export class DemoSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    for (const person of DEMO_PEOPLE) await ensureUser(em, person);
    await em.flush();
  }
}
