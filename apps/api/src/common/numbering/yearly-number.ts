import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * The next reference of the form PREFIX-YYYY-NNNN (S-2026-0007), counting within the year.
 * Takes a transaction-scoped advisory lock named after the prefix first, so two requests never
 * draw the same number; call it inside the transaction that inserts the row.
 */
export async function nextYearlyNumber(
  em: EntityManager,
  reference: { prefix: string; table: string; column: string },
  now = new Date(),
): Promise<string> {
  const { prefix, table, column } = reference;
  await lockNumbering(em, prefix);
  const stem = `${prefix}-${now.getUTCFullYear()}-`;
  const [row] = await em.execute<{ last: number | null }[]>(
    `select max(substring(${column} from ?)::int) as last from ${table} where ${column} like ?`,
    [`^${stem}(\\d+)$`, `${stem}%`],
  );
  return `${stem}${String((row?.last ?? 0) + 1).padStart(4, '0')}`;
}

/** The transaction-scoped lock behind PREFIX numbers; taking it again in the same transaction is free. */
export async function lockNumbering(em: EntityManager, prefix: string): Promise<void> {
  await em.execute(`select pg_advisory_xact_lock(hashtext(?))`, [`evenset.number.${prefix}`]);
}
