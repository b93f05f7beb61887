/**
 * Shop marks for components ("F2", "E1", "T1"), the names users see on screen and on paper
 * instead of the design's internal node ids.
 *
 * Prefixes (our own): F flange, E elbow (butt-weld, mitred or socket-weld), U 180° return,
 * T tee (butt-weld or socket-weld), R reducer, O branch connection (set-on branch, half
 * coupling, branch outlet), K socket-weld coupling, S other socket-weld fitting, C cap,
 * OE open end (bevel or plain end).
 *
 * Flanges are numbered in the order of `result.flanges` (the flange orientation details the
 * sheet tags F1, F2…), every other prefix in the engine's component order (tree order from
 * the root). Numbers restart at 1 per prefix. Pipe pieces (P#) and welds (W#) keep the marks
 * the engine gives them (`PipePiece.mark`, `WeldResult.mark`).
 */
import type { ComponentResult, SpoolResult } from './compute-result';

/** The parts of a result that marks depend on. */
export type MarkSource = Pick<SpoolResult, 'components' | 'flanges'>;

/** The mark prefix for one component (see the module comment), from its computed shape. */
export function markPrefix(component: Pick<ComponentResult, 'shape'>): string {
  const s = component.shape;
  switch (s.type) {
    case 'flange':
      return 'F';
    case 'elbow':
      return 'E';
    case 'return':
      return 'U';
    case 'tee':
      return 'T';
    case 'reducer':
      return 'R';
    case 'set-on-branch':
    case 'branch-connection':
      return 'O';
    case 'cap':
      return 'C';
    case 'open-end':
      return 'OE';
    case 'socket-fitting':
      if (s.fitting === 'elbow90' || s.fitting === 'elbow45') return 'E';
      if (s.fitting === 'tee') return 'T';
      if (s.fitting === 'coupling') return 'K';
      if (s.fitting === 'cap') return 'C';
      return 'S';
  }
}

/**
 * Marks of every component of `result`: node id → mark. Deterministic for a given result
 * (the same design always gets the same marks); a node the engine could not place has no
 * component and so no mark.
 */
export function componentMarks(result: MarkSource): Map<string, string> {
  const marks = new Map<string, string>();
  const counts = new Map<string, number>();
  const next = (prefix: string) => {
    const n = (counts.get(prefix) ?? 0) + 1;
    counts.set(prefix, n);
    return `${prefix}${n}`;
  };
  const flangeNodes = new Set(
    result.components.filter((c) => c.shape.type === 'flange').map((c) => c.nodeId),
  );
  // Flanges first, in the orientation details' order, so F# matches the sheet's flange tags.
  for (const f of result.flanges) {
    if (flangeNodes.has(f.nodeId) && !marks.has(f.nodeId)) marks.set(f.nodeId, next('F'));
  }
  for (const c of result.components) {
    if (marks.has(c.nodeId)) continue;
    marks.set(c.nodeId, next(markPrefix(c)));
  }
  return marks;
}

/** The mark of `nodeId`, or a neutral "component" when it has none (never the internal id). */
export function markOf(marks: ReadonlyMap<string, string>, nodeId: string): string {
  return marks.get(nodeId) ?? 'component';
}
