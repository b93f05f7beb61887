import type { ReactNode } from 'react';
import { cn } from '../../lib/cn';

export type SortOrder = 'asc' | 'desc';

export interface Column<Row> {
  key: string;
  header: string;
  /** Cell content; keep dimensions in font-mono with their unit. */
  cell: (row: Row) => ReactNode;
  sortable?: boolean;
  align?: 'left' | 'right';
  /** Hide on narrow screens (the card layout still shows everything marked primary). */
  className?: string;
  /** Shown on the small-screen card too (besides the card's title). */
  card?: boolean;
}

interface TableProps<Row> {
  caption: string;
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
  sort?: { field: string; order: SortOrder };
  onSort?: (field: string) => void;
  /** Makes the whole row a target (e.g. open the spool). */
  onRowClick?: (row: Row) => void;
  busy?: boolean;
  /**
   * Below 640 px the rows become a list of cards (no sideways scrolling): `cardTitle`
   * heads each card, then every column marked `card` as "header: value".
   */
  cardTitle?: (row: Row) => ReactNode;
}

function SortIcon({ state }: { state: SortOrder | null }) {
  return (
    <svg viewBox="0 0 10 14" aria-hidden="true" className="h-3.5 w-2.5 shrink-0">
      <path d="M5 1L9 5H1z" fill="currentColor" opacity={state === 'asc' ? 1 : 0.3} />
      <path d="M5 13L1 9h8z" fill="currentColor" opacity={state === 'desc' ? 1 : 0.3} />
    </svg>
  );
}

/**
 * A data table with sortable headers (aria-sort, real buttons). With `cardTitle`, small
 * screens get a list of cards instead; without, the table scrolls sideways in its frame.
 */
export function Table<Row>(props: TableProps<Row>) {
  if (!props.cardTitle) return <DataTable {...props} />;
  return (
    <>
      <div className="hidden sm:block">
        <DataTable {...props} />
      </div>
      <CardList {...props} cardTitle={props.cardTitle} />
    </>
  );
}

function CardList<Row>({ caption, columns, rows, rowKey, onRowClick, busy, cardTitle }: TableProps<Row> & { cardTitle: (row: Row) => ReactNode }) {
  const shown = columns.filter((c) => c.card);
  return (
    <ul aria-label={caption} className={cn('flex flex-col gap-2 sm:hidden', busy && 'opacity-70')} data-testid="card-list">
      {rows.map((row) => (
        <li
          key={rowKey(row)}
          onClick={onRowClick ? () => onRowClick(row) : undefined}
          className={cn('rounded-lg border border-steel-200 bg-white px-3 py-2', onRowClick && 'cursor-pointer hover:bg-spark-100/50')}
        >
          <div className="text-base">{cardTitle(row)}</div>
          <dl className="mt-1 grid grid-cols-[auto_minmax(0,1fr)] items-center gap-x-3 gap-y-1 text-sm">
            {shown.map((col) => (
              <div key={col.key} className="contents">
                <dt className="text-xs font-semibold uppercase tracking-wide text-steel-600">{col.header}</dt>
                <dd className="min-w-0">{col.cell(row)}</dd>
              </div>
            ))}
          </dl>
        </li>
      ))}
    </ul>
  );
}

function DataTable<Row>({ caption, columns, rows, rowKey, sort, onSort, onRowClick, busy }: TableProps<Row>) {
  return (
    <div className={cn('overflow-x-auto rounded-lg border border-steel-200 bg-white', busy && 'opacity-70')}>
      <table className="w-full min-w-[36rem] border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-steel-50 text-xs uppercase tracking-wide text-steel-600">
          <tr>
            {columns.map((col) => {
              const state = sort && sort.field === col.key ? sort.order : null;
              return (
                <th
                  key={col.key}
                  scope="col"
                  aria-sort={state === 'asc' ? 'ascending' : state === 'desc' ? 'descending' : undefined}
                  className={cn('border-b border-steel-200 px-4 py-0 font-semibold', col.align === 'right' && 'text-right', col.className)}
                >
                  {col.sortable && onSort ? (
                    <button
                      type="button"
                      onClick={() => onSort(col.key)}
                      className={cn(
                        'inline-flex min-h-11 items-center gap-1.5 uppercase hover:text-ink-900',
                        state && 'text-ink-900',
                      )}
                    >
                      {col.header}
                      <SortIcon state={state} />
                    </button>
                  ) : (
                    <span className="inline-flex min-h-11 items-center">{col.header}</span>
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr
              key={rowKey(row)}
              onClick={onRowClick ? () => onRowClick(row) : undefined}
              className={cn('border-b border-steel-100 last:border-0', onRowClick && 'cursor-pointer hover:bg-spark-100/50')}
            >
              {columns.map((col) => (
                <td key={col.key} className={cn('px-4 py-3 align-middle', col.align === 'right' && 'text-right', col.className)}>
                  {col.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
