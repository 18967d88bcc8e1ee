import type { EntityManager } from '@mikro-orm/postgresql';
import type { MaterialInput } from '@evenset/contracts';
import { Material } from '../../materials/material.entity';

/** Creates a material, or returns the existing one with that name (seeding is idempotent). */
export async function ensureMaterial(em: EntityManager, seed: MaterialInput): Promise<Material> {
  const existing = await em.findOne(Material, { name: seed.name });
  if (existing) return existing;
  const material = em.create(Material, { ...seed, createdAt: new Date(), updatedAt: new Date() });
  em.persist(material);
  return material;
}
