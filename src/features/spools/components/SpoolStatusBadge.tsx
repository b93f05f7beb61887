import type { SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import { StatusBadge } from '../../../components/ui/StatusBadge';
import { spoolStatusDisplay } from './spool-status-labels';

/** A spool's shop-floor status as a labelled badge. */
export function SpoolStatusBadge({ status }: { status: SpoolStatus }) {
  const d = spoolStatusDisplay[status];
  return <StatusBadge tone={d.tone} label={d.label} />;
}
