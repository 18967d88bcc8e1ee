import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Inserts many rows in one statement: the rows go as one JSON document that PostgreSQL unpacks
 * with `json_to_recordset`. No parameter-count limit and no per-row work in the ORM, for bulk
 * writes of permanent records (a CSV import of 100,000 readings). `columns` maps each column to its
 * SQL type; rows are keyed by column name. Runs in the caller's transaction. With `returning`,
 * answers the rows as stored (PostgreSQL's values, rounded to the columns' scales).
 *
 * The document is sent as a bind parameter through the ORM's query builder rather than
 * `em.execute`, which inlines parameters into the SQL text: quoting a 20 MB literal character by
 * character took tens of seconds and over a gigabyte of memory. Driver errors are converted to
 * the ORM's exceptions, as `em.execute` would.
 */
export async function insertRows(
  em: EntityManager,
  table: string,
  columns: Record<string, string>,
  rows: Record<string, unknown>[],
  returning = false,
): Promise<Record<string, unknown>[]> {
  if (!rows.length) return [];
  const names = Object.keys(columns);
  const raw = em.getKnex().raw(
    `insert into "${table}" (${names.map((n) => `"${n}"`).join(', ')})
       select * from json_to_recordset(?::json) as r(${names.map((n) => `"${n}" ${columns[n]}`).join(', ')})
       ${returning ? 'returning *' : ''}`,
    [JSON.stringify(rows)],
  );
  const transaction = em.getTransactionContext();
  try {
    const result = (await (transaction ? raw.transacting(transaction) : raw)) as { rows: Record<string, unknown>[] };
    return result.rows;
  } catch (error) {
    throw error instanceof Error ? em.getDriver().convertException(error) : error;
  }
}
