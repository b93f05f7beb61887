import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { Pagination } from '../../../src/components/ui/Pagination';

const noop = () => {};

describe('Pagination', () => {
  it('shows the range of the current page and the total', () => {
    const html = renderToStaticMarkup(<Pagination page={2} pageSize={20} total={57} onPage={noop} noun="spools" />);
    expect(html).toContain('21–40');
    expect(html).toContain('57');
    expect(html).toContain('2 / 3');
  });

  it('disables Next on the last page and Previous on the first', () => {
    const last = renderToStaticMarkup(<Pagination page={3} pageSize={20} total={57} onPage={noop} />);
    expect(last).toMatch(/disabled="">Next/);
    const first = renderToStaticMarkup(<Pagination page={1} pageSize={20} total={57} onPage={noop} />);
    expect(first).toMatch(/disabled="">Previous/);
  });

  it('speaks of one item in the singular', () => {
    const html = renderToStaticMarkup(<Pagination page={1} pageSize={20} total={1} onPage={noop} noun="spools" />);
    expect(html).toMatch(/>1<\/span> of <span[^>]*>1<\/span> spool<\/p>/);
  });

  it('renders nothing for an empty list', () => {
    expect(renderToStaticMarkup(<Pagination page={1} pageSize={20} total={0} onPage={noop} />)).toBe('');
  });
});
