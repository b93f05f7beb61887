import { Button } from './Button';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  noun?: string;
}

/** "21–40 of 57 spools" (nouns are given plural) with previous/next buttons; hidden when there is nothing to page. */
export function Pagination({ page, pageSize, total, onPage, noun = 'items' }: PaginationProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (total === 0) return null;
  const from = (page - 1) * pageSize + 1;
  const to = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3 py-3 text-sm text-steel-600">
      <p>
        <span className="font-mono">{from === to ? from : `${from}–${to}`}</span> of{' '}
        <span className="font-mono">{total}</span> {total === 1 ? noun.replace(/s$/, '') : noun}
      </p>
      {pages > 1 ? (
        <div className="flex items-center gap-2">
          <Button variant="secondary" onClick={() => onPage(page - 1)} disabled={page <= 1}>
            Previous
          </Button>
          <span className="px-2 font-mono">
            {page} / {pages}
          </span>
          <Button variant="secondary" onClick={() => onPage(page + 1)} disabled={page >= pages}>
            Next
          </Button>
        </div>
      ) : null}
    </nav>
  );
}
