import { apiUrl } from '../../../lib/api-client';
import type { PaperSize } from '../../../../shared/schemas/sheet-query.schema';

/** URL of a spool's printable sheet; without a revision the server prints the latest issued one (else the draft). */
export function spoolSheetUrl(
  spoolId: string,
  options: { paper: PaperSize; revisionId?: string | null },
): string {
  return apiUrl(`/spools/${spoolId}/sheet.pdf`, {
    paper: options.paper,
    revision: options.revisionId ?? undefined,
  });
}

/** URL of a job's saw list; without spool ids the server takes every open spool of the job. */
export function sawListUrl(jobId: string, options: { paper: PaperSize; spoolIds?: string[] }): string {
  const spools = options.spoolIds && options.spoolIds.length > 0 ? options.spoolIds.join(',') : undefined;
  return apiUrl(`/jobs/${jobId}/saw-list.pdf`, { paper: options.paper, spools });
}
