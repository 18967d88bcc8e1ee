import type { EntityManager } from '@mikro-orm/postgresql';

/** Rows for one table, keyed by column name; `columns` maps each column to its SQL type. */
export interface TableRows {
  table: string;
  columns: Record<string, string>;
  rows: Record<string, unknown>[];
}

/** The insert of one table's rows, unpacked from JSON document number `param`. */
function insertOf({ table, columns }: TableRows, returning: boolean): string {
  const names = Object.keys(columns);
  return `insert into "${table}" (${names.map((n) => `"${n}"`).join(', ')})
    select * from json_to_recordset(?::json) as r(${names.map((n) => `"${n}" ${columns[n]}`).join(', ')})
    ${returning ? 'returning *' : ''}`;
}

/** A stored row as JSON gave it, with times as Date (as the driver gives them). */
function fromJson(row: Record<string, unknown>, columns: Record<string, string>): Record<string, unknown> {
  for (const [name, type] of Object.entries(columns))
    if (type === 'timestamptz' && typeof row[name] === 'string') row[name] = new Date(row[name]);
  return row;
}

/**
 * Inserts rows into several tables in one statement, each table's rows as one JSON document that
 * PostgreSQL unpacks with `json_to_recordset`, the inserts chained as `with` clauses in the order
 * given (keys before the rows that refer to them). One statement is one round trip and is atomic by
 * itself, in or out of a transaction: a bench save writes its inspection, readings, result and
 * audit entry at once. No parameter-count limit and no per-row work in the ORM, for bulk writes of
 * permanent records (a CSV import of 100,000 readings). Runs in the caller's transaction if any.
 * With `returning`, answers each table's rows as stored (PostgreSQL's values, rounded to the
 * columns' scales), in the order of `tables`.
 *
 * The documents are sent as bind parameters through the ORM's query builder rather than
 * `em.execute`, which inlines parameters into the SQL text: quoting a 20 MB literal character by
 * character took tens of seconds and over a gigabyte of memory. Driver errors are converted to
 * the ORM's exceptions, as `em.execute` would.
 */
export async function insertAll(
  em: EntityManager,
  tables: TableRows[],
  returning = false,
): Promise<Record<string, unknown>[][]> {
  const written = tables.filter((t) => t.rows.length);
  if (!written.length) return tables.map(() => []);
  const clauses = written.map((t, i) => `"w${i}" as (${insertOf(t, returning)})`);
  const answer = returning
    ? written.map((_, i) => `(select coalesce(json_agg("w${i}"), '[]') from "w${i}") as "w${i}"`).join(', ')
    : '1';
  const raw = em.getKnex().raw(
    `with ${clauses.join(', ')} select ${answer}`,
    written.map((t) => JSON.stringify(t.rows)),
  );
  const transaction = em.getTransactionContext();
  let result: { rows: Record<string, Record<string, unknown>[]>[] };
  try {
    result = await (transaction ? raw.transacting(transaction) : raw);
  } catch (error) {
    throw error instanceof Error ? em.getDriver().convertException(error) : error;
  }
  if (!returning) return tables.map(() => []);
  const stored = result.rows[0]!;
  return tables.map((t) => {
    const i = written.indexOf(t);
    return i < 0 ? [] : stored[`w${i}`]!.map((row) => fromJson(row, t.columns));
  });
}
