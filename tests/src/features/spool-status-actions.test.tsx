import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/role.schema';
import type { Spool } from '../../../shared/schemas/spool.schema';
import type { SpoolStatus } from '../../../shared/schemas/spool-status.schema';
import { SpoolStatusActions } from '../../../src/features/spools/components/SpoolStatusActions';
import { spoolStatusDisplay } from '../../../src/features/spools/components/spool-status-labels';

function spool(status: SpoolStatus): Spool {
  const t = '2026-12-01T10:00:00.000Z';
  return {
    id: '00000000-0000-4000-8000-000000000001',
    jobId: '00000000-0000-4000-8000-000000000002',
    mark: 'CW-201-S03',
    lineNumber: 'CW-201',
    status,
    currentRevision: null,
    draft: null,
    archivedAt: null,
    createdAt: t,
    updatedAt: t,
    version: 3,
  };
}

function render(role: Role, status: SpoolStatus): string {
  return renderToStaticMarkup(
    <QueryClientProvider client={new QueryClient()}>
      <SpoolStatusActions spool={spool(status)} role={role} />
    </QueryClientProvider>,
  );
}

describe('SpoolStatusActions', () => {
  it('offers a fabricator only the next shop step', () => {
    const html = render('fabricator', 'issued');
    expect(html).toContain('Record as cut');
    expect(html).not.toContain('Record as fitted up');
    expect(html).not.toContain('released');
  });

  it('offers an inspector inspection and release, never cutting', () => {
    expect(render('inspector', 'welded')).toContain('Record as inspected');
    expect(render('inspector', 'inspected')).toContain('Record as released');
    expect(render('inspector', 'issued')).toBe('');
  });

  it('words every stage button the same way: "Record as" and the status as shown', () => {
    for (const s of ['issued', 'cut', 'fitted', 'welded', 'inspected', 'released', 'shipped'] as const) {
      const { label, action } = spoolStatusDisplay[s];
      expect(action).toBe(`Record as ${label.toLowerCase()}`);
    }
  });

  it('shows nothing to a viewer or a detailer, whatever the status', () => {
    for (const status of ['drafting', 'issued', 'welded'] as const) {
      expect(render('viewer', status)).toBe('');
      expect(render('detailer', status)).toBe('');
    }
  });

  it('gives an admin a picker of every other status', () => {
    const html = render('admin', 'cut');
    expect(html).toContain('Set status');
    expect(html).toContain('On hold');
    expect(html).not.toMatch(/<option value="cut"/);
  });
});
