import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Locks one row against the same lock for the rest of the transaction (append-only tables refuse
 * UPDATE, not row locks). NO KEY UPDATE, not UPDATE: a set allocation that holds the numbering
 * lock must still be able to insert a member referencing the part, or the two would deadlock.
 */
export async function lockRow(em: EntityManager, table: 'part' | 'grind_request', id: string): Promise<boolean> {
  const rows = await em.execute<{ id: string }[]>(`select id from ${table} where id = ? for no key update`, [id]);
  return rows.length > 0;
}
