import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';

/** Escapes `%`, `_` and `\` so user text matches literally inside ILIKE. */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * Applies a whitelisted sort, a stable tiebreak on id, and the page window.
 * `columns` maps API sort fields to SQL expressions; only those can be sorted on.
 */
export function applySortAndPage<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  alias: string,
  columns: Record<string, string>,
  query: { sort: string; order: 'asc' | 'desc'; page: number; pageSize: number },
): SelectQueryBuilder<T> {
  const column = columns[query.sort];
  if (!column) throw new Error(`sort field ${query.sort} has no column`);
  const order = query.order === 'asc' ? 'ASC' : 'DESC';
  return qb
    .orderBy(column, order, order === 'ASC' ? 'NULLS FIRST' : 'NULLS LAST')
    .addOrderBy(`${alias}.id`, 'ASC')
    .offset((query.page - 1) * query.pageSize)
    .limit(query.pageSize);
}
