import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { elementKind } from '../model/design-graph';
import type { Selection } from '../model/editor-selection';
import type { UserNames } from '../model/user-names';
import { cn } from '../../../lib/cn';

/** The engine's errors and warnings; clicking one selects the component it is about. */
export function ChecksPanel({ result, design, names, onSelect }: { result: SpoolResult; design: SpoolDesign; names: UserNames; onSelect: (s: Selection) => void }) {
  if (result.issues.length === 0) {
    return <p className="p-3 text-sm text-ok-600">No problems found: every length can be cut and every fitting is made.</p>;
  }
  const sorted = [...result.issues].sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'error' ? -1 : 1));
  return (
    <ul className="flex flex-col divide-y divide-steel-200 text-sm" data-testid="checks-list">
      {sorted.map((issue, i) => {
        const kind = issue.componentId ? elementKind(design, issue.componentId) : null;
        const body = (
          <>
            <span
              className={cn(
                'mr-2 inline-block rounded px-1.5 py-0.5 text-[11px] font-bold uppercase',
                issue.severity === 'error' ? 'bg-danger-600 text-white' : 'bg-spark-200 text-spark-700',
              )}
            >
              {issue.severity === 'error' ? 'Error' : 'Warning'}
            </span>
            {names.text(issue.message)}
            {kind ? <span className="ml-1 font-mono text-xs text-steel-600">({kind === 'node' ? names.node(issue.componentId!) : names.run(issue.componentId!)})</span> : null}
          </>
        );
        return (
          <li key={`${issue.code}-${i}`}>
            {kind ? (
              <button type="button" className="w-full px-2 py-2 text-left hover:bg-spark-100/60" onClick={() => onSelect({ type: kind, id: issue.componentId! })}>
                {body}
              </button>
            ) : (
              <p className="px-2 py-2">{body}</p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
