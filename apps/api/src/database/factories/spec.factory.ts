import type { EntityManager } from '@mikro-orm/postgresql';
import type { SpecDefinition, SpecStatus } from '@evenset/contracts';
import type { Material } from '../../materials/material.entity';
import { Spec } from '../../specs/spec.entity';

export interface SpecSeed {
  partNumber: string;
  revision: string;
  status: SpecStatus;
  /** The revision this one was made from, when it exists. */
  previous?: Spec;
  material: Material;
  definition: Omit<SpecDefinition, 'materialId'>;
}

/** Creates a spec revision, or returns the existing one (seeding is idempotent). */
export async function ensureSpec(em: EntityManager, seed: SpecSeed): Promise<Spec> {
  const existing = await em.findOne(Spec, { partNumber: seed.partNumber, revision: seed.revision });
  if (existing) return existing;
  const { partNumber, revision, status, previous, material } = seed;
  const spec = Spec.revision(
    { partNumber, revision, status, previous },
    { ...seed.definition, materialId: material.id },
    material,
  );
  if (seed.status !== 'draft') {
    spec.releasedAt = new Date();
    spec.freezeExpansion();
  }
  em.persist(spec);
  return spec;
}
