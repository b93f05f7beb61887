import type { SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import type { StatusTone } from '../../../components/ui/StatusBadge';

/**
 * How each spool status reads on screen, and its colour family. Every button that moves a
 * spool along the shop's stages says the same thing, "Record as <status>": it records a
 * stage reached (the confirmation asks "Record <mark> as <status>?"); only the two moves
 * that are not a stage reached say what they do instead.
 */
export const spoolStatusDisplay: Record<SpoolStatus, { label: string; tone: StatusTone; action: string }> = {
  drafting: { label: 'In drafting', tone: 'draft', action: 'Back to drafting' },
  issued: { label: 'Issued to bay', tone: 'issued', action: 'Record as issued to bay' },
  cut: { label: 'Cut', tone: 'work', action: 'Record as cut' },
  fitted: { label: 'Fitted up', tone: 'work', action: 'Record as fitted up' },
  welded: { label: 'Welded', tone: 'work', action: 'Record as welded' },
  inspected: { label: 'Inspected', tone: 'check', action: 'Record as inspected' },
  released: { label: 'Released', tone: 'done', action: 'Record as released' },
  shipped: { label: 'Shipped', tone: 'shipped', action: 'Record as shipped' },
  'on-hold': { label: 'On hold', tone: 'hold', action: 'Put on hold' },
};
