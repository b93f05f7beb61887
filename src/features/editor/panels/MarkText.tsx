import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { useUserNames } from '../hooks/use-user-names';

/** A component's shop mark (or "run F1–E1" for a run id), never the internal id. */
export function MarkText({ result, design, id }: { result: SpoolResult | null; design: SpoolDesign | null; id: string }) {
  const names = useUserNames(result, design);
  return <>{names.element(id)}</>;
}
