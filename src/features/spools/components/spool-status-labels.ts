import type { SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import type { StatusTone } from '../../../components/ui/StatusBadge';

/** How each spool status reads on screen, and its colour family. */
export const spoolStatusDisplay: Record<SpoolStatus, { label: string; tone: StatusTone; action: string }> = {
  drafting: { label: 'In drafting', tone: 'draft', action: 'Back to drafting' },
  issued: { label: 'Issued to bay', tone: 'issued', action: 'Mark issued' },
  cut: { label: 'Cut', tone: 'work', action: 'Mark cut' },
  fitted: { label: 'Fitted up', tone: 'work', action: 'Mark fitted up' },
  welded: { label: 'Welded', tone: 'work', action: 'Mark welded' },
  inspected: { label: 'Inspected', tone: 'check', action: 'Mark inspected' },
  released: { label: 'Released', tone: 'done', action: 'Release' },
  shipped: { label: 'Shipped', tone: 'shipped', action: 'Mark shipped' },
  'on-hold': { label: 'On hold', tone: 'hold', action: 'Put on hold' },
};
