import type { EntityManager } from '@mikro-orm/postgresql';
import { Seeder } from '@mikro-orm/seeder';
import { ensureInstrument } from '../factories/instrument.factory';
import { ensureMaster } from '../factories/master.factory';
import { ensureMaterial } from '../factories/material.factory';
import { ensureSpec } from '../factories/spec.factory';
import { ensureUser } from '../factories/user.factory';
import { demoInstruments, demoMasters } from './demo-gauges';
import { seedDemoGaugeStudy } from './demo-gauge-study';
import { seedDemoLots } from './demo-lots';
import { seedDemoSales } from './demo-sales';
import { DEMO_PEOPLE } from './demo-people';
import { LR90_REV_A, PP6_REV_A, RB40_REV_A, RB40_REV_B } from './demo-specs';
import { SHOP_MATERIALS, STEEL } from './shop-materials';

/** The invented demo scenario of brief.md. Safe to run again: it only adds what is missing. */
export class DemoSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    for (const person of DEMO_PEOPLE) await ensureUser(em, person);
    for (const material of SHOP_MATERIALS) await ensureMaterial(em, material);
    await em.flush();

    const steel = await ensureMaterial(em, STEEL);
    const rb40a = await ensureSpec(em, {
      partNumber: 'RB-40',
      revision: 'A',
      status: 'superseded',
      material: steel,
      definition: RB40_REV_A,
    });
    await ensureSpec(em, {
      partNumber: 'RB-40',
      revision: 'B',
      status: 'released',
      previous: rb40a,
      material: steel,
      definition: RB40_REV_B,
    });
    const released = { revision: 'A', status: 'released', material: steel } as const;
    await ensureSpec(em, { ...released, partNumber: 'PP-6', definition: PP6_REV_A });
    await ensureSpec(em, { ...released, partNumber: 'LR-90', definition: LR90_REV_A });
    for (const master of demoMasters(steel)) await ensureMaster(em, master);
    for (const instrument of demoInstruments()) await ensureInstrument(em, instrument);
    await em.flush();
    await seedDemoLots(em);
    await seedDemoSales(em);
    await seedDemoGaugeStudy(em);
  }
}
