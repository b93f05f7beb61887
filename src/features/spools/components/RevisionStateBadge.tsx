import type { RevisionState } from '../../../../shared/schemas/revision.schema';
import { StatusBadge, type StatusTone } from '../../../components/ui/StatusBadge';

const display: Record<RevisionState, { label: string; tone: StatusTone }> = {
  draft: { label: 'Working draft', tone: 'draft' },
  issued: { label: 'Current issue', tone: 'issued' },
  superseded: { label: 'Superseded', tone: 'muted' },
};

/** A revision's state as a labelled badge. */
export function RevisionStateBadge({ state }: { state: RevisionState }) {
  return <StatusBadge tone={display[state].tone} label={display[state].label} />;
}
