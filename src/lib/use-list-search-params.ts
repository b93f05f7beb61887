import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

/** Sort, page and search text of a list, kept in the URL so a view can be shared and survives reload. */
export interface ListState<F extends string> {
  page: number;
  sort: F;
  order: 'asc' | 'desc';
  q: string;
}

/**
 * Reads and writes a list's state in the query string. Unknown sort fields fall
 * back to the default; a new sort or search goes back to page 1.
 */
export function useListSearchParams<F extends string>(sortFields: readonly F[], defaults: { sort: F; order: 'asc' | 'desc' }) {
  const [params, setParams] = useSearchParams();

  const state = useMemo<ListState<F>>(() => {
    const sortParam = params.get('sort');
    const sort = sortFields.includes(sortParam as F) ? (sortParam as F) : defaults.sort;
    const orderParam = params.get('order');
    const order = orderParam === 'asc' || orderParam === 'desc' ? orderParam : defaults.order;
    const pageNum = Number(params.get('page'));
    const page = Number.isInteger(pageNum) && pageNum >= 1 ? pageNum : 1;
    return { page, sort, order, q: params.get('q') ?? '' };
  }, [params, sortFields, defaults.sort, defaults.order]);

  const update = useCallback(
    (patch: Partial<ListState<F>>) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, value] of Object.entries(patch)) {
            if (value === undefined || value === '' || (key === 'page' && value === 1)) next.delete(key);
            else next.set(key, String(value));
          }
          return next;
        },
        { replace: true },
      );
    },
    [setParams],
  );

  /** Clicking a header: same field flips the order, a new field sorts ascending. */
  const toggleSort = useCallback(
    (field: string) => {
      if (!sortFields.includes(field as F)) return;
      const order = state.sort === field && state.order === 'asc' ? 'desc' : 'asc';
      update({ sort: field as F, order, page: 1 });
    },
    [sortFields, state.sort, state.order, update],
  );

  return { state, update, toggleSort };
}
