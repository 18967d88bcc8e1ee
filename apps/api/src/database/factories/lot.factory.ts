import type { EntityManager } from '@mikro-orm/postgresql';
import { Lot } from '../../lots/lot.entity';
import { Part } from '../../lots/part.entity';
import type { Spec } from '../../specs/spec.entity';

export interface LotSeed {
  lotNumber: string;
  spec: Spec;
  quantity?: number;
  grindDate: string;
  notes?: string;
  serials: string[];
}

/** Creates and flushes a lot with its parts, or returns the existing one (seeding is idempotent). */
export async function ensureLot(em: EntityManager, seed: LotSeed): Promise<Lot> {
  const existing = await em.findOne(Lot, { lotNumber: seed.lotNumber });
  if (existing) return existing;
  const lot = em.create(Lot, {
    lotNumber: seed.lotNumber,
    spec: seed.spec,
    quantity: seed.quantity ?? seed.serials.length,
    grindDate: seed.grindDate,
    notes: seed.notes ?? null,
    createdAt: new Date(),
  });
  em.persist(lot);
  for (const serial of seed.serials)
    em.persist(em.create(Part, { lot, partNumber: seed.spec.partNumber, serial, createdAt: new Date() }));
  await em.flush();
  return lot;
}
