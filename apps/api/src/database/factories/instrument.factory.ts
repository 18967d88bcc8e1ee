import type { EntityManager } from '@mikro-orm/postgresql';
import type { InstrumentKind } from '@evenset/contracts';
import { Instrument } from '../../instruments/instrument.entity';

export interface InstrumentSeed {
  code: string;
  kind: InstrumentKind;
  description: string;
  resolutionMm: number;
  calibrationDueOn: string;
}

/** Creates an instrument, or returns the existing one with that code (seeding is idempotent). */
export async function ensureInstrument(em: EntityManager, seed: InstrumentSeed): Promise<Instrument> {
  const existing = await em.findOne(Instrument, { code: seed.code });
  if (existing) return existing;
  const instrument = em.create(Instrument, { ...seed, createdAt: new Date(), updatedAt: new Date() });
  em.persist(instrument);
  return instrument;
}
