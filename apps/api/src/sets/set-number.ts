import type { EntityManager } from '@mikro-orm/postgresql';
import { lockNumbering, nextYearlyNumber } from '../common/numbering/yearly-number';

/** The next set number, S-YYYY-NNNN; call inside the allocating transaction. */
export function nextSetNumber(em: EntityManager, now = new Date()): Promise<string> {
  return nextYearlyNumber(em, { prefix: 'S', table: 'matched_set', column: 'set_number' }, now);
}

/**
 * Serialises every change to free stock — set allocation, replacement allocation, grind requests
 * — behind the set-numbering lock, so each sees the others' committed work and none deadlock.
 * Take it first in the transaction.
 */
export function lockFreeStock(em: EntityManager): Promise<void> {
  return lockNumbering(em, 'S');
}
