import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Inserts many rows in one statement: the rows go as one JSON document that PostgreSQL unpacks
 * with `json_to_recordset`. No parameter-count limit and no per-row work in the ORM, for bulk
 * writes of permanent records (a CSV import of 100,000 readings). `columns` maps each column to its
 * SQL type; rows are keyed by column name. Runs in the caller's transaction.
 */
export async function insertRows(
  em: EntityManager,
  table: string,
  columns: Record<string, string>,
  rows: Record<string, unknown>[],
): Promise<void> {
  if (!rows.length) return;
  const names = Object.keys(columns);
  await em.execute(
    `insert into "${table}" (${names.map((n) => `"${n}"`).join(', ')})
     select * from json_to_recordset(?::json) as r(${names.map((n) => `"${n}" ${columns[n]}`).join(', ')})`,
    [JSON.stringify(rows)],
  );
}
