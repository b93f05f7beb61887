import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { spoolStatusSchema } from '../../../shared/schemas/spool-status.schema';
import { spoolStatusDisplay } from '../../../src/features/spools/components/spool-status-labels';
import { SpoolStatusBadge } from '../../../src/features/spools/components/SpoolStatusBadge';

describe('SpoolStatusBadge', () => {
  it('always prints a text label, never colour alone', () => {
    for (const status of spoolStatusSchema.options) {
      const html = renderToStaticMarkup(<SpoolStatusBadge status={status} />);
      expect(html).toContain(spoolStatusDisplay[status].label);
    }
  });

  it('gives every status its own label', () => {
    const labels = spoolStatusSchema.options.map((s) => spoolStatusDisplay[s].label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});
