import type { EntityManager } from '@mikro-orm/postgresql';
import { nextYearlyNumber } from '../common/numbering/yearly-number';

/** The next grind request number, GR-YYYY-NNNN; call inside the transaction that inserts it. */
export function nextGrindRequestNumber(em: EntityManager, now = new Date()): Promise<string> {
  return nextYearlyNumber(em, { prefix: 'GR', table: 'grind_request', column: 'request_number' }, now);
}
