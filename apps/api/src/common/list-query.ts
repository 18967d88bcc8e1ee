import type { FilterQuery, FindOptions } from '@mikro-orm/core';
import { QueryOrder } from '@mikro-orm/core';
import type { ListQuery } from '@evenset/contracts';

/**
 * Paging and sorting of a list query; an unknown sort field falls back to `fallback` ascending.
 * Ties are broken by `thenBy` (ascending), then by id, so pages never overlap.
 */
export function listOptions<T extends object>(
  query: ListQuery,
  sortable: readonly string[],
  fallback: string,
  thenBy: readonly string[] = [],
): Pick<FindOptions<T>, 'orderBy' | 'limit' | 'offset'> {
  const [field, direction] = (query.sort ?? `${fallback}:asc`).split(':');
  const orderBy =
    field && sortable.includes(field)
      ? { [field]: direction === 'desc' ? QueryOrder.DESC : QueryOrder.ASC }
      : { [fallback]: QueryOrder.ASC };
  return {
    orderBy: [
      orderBy,
      ...thenBy.map((f) => ({ [f]: QueryOrder.ASC })),
      { id: QueryOrder.ASC },
    ] as unknown as FindOptions<T>['orderBy'],
    limit: query.pageSize,
    offset: query.page * query.pageSize,
  };
}

/** Case-insensitive "contains" over any of the given text fields; no filter without search text. */
export function searchAny<T extends object>(q: string | undefined, fields: readonly string[]): FilterQuery<T> {
  if (!q) return {} as FilterQuery<T>;
  const pattern = `%${escapeLike(q)}%`;
  return { $or: fields.map((field) => ({ [field]: { $ilike: pattern } })) } as FilterQuery<T>;
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}
