/**
 * End preparation of a pipe end (ASME B16.25): bevel 37.5° for butt welds above 3 mm wall,
 * square at or below, compound bevel above 22 mm; square for sockets and slip-ons; saddle
 * for set-on branches; mitre cuts for mitred bends.
 */
import type { EndPrep } from './compute-result';
import type { NodeEnd } from './node-analysis';

/** Wall at or below which butt-weld ends are cut square, mm (ASME B16.25). */
export const SQUARE_END_MAX_WALL_MM = 3;
/** Wall above which the bevel is compound (37.5° then 10°), mm (ASME B16.25). */
export const COMPOUND_BEVEL_MIN_WALL_MM = 22;

/** Preparation of a pipe end meeting `end` at node `nodeId`, for a pipe of wall `wallMm`. */
export function endPrepFor(
  end: NodeEnd | null,
  nodeId: string,
  wallMm: number | null,
  branchOf?: string,
): EndPrep {
  const bevel = (): EndPrep => {
    if (wallMm !== null && wallMm <= SQUARE_END_MAX_WALL_MM)
      return { type: 'square', label: 'square (wall ≤ 3 mm)', nodeId };
    if (wallMm !== null && wallMm > COMPOUND_BEVEL_MIN_WALL_MM)
      return { type: 'compound-bevel', label: 'compound bevel 37.5°/10°', nodeId };
    return { type: 'bevel', label: 'bevel 37.5°', nodeId };
  };
  if (!end) return bevel();
  switch (end.prep) {
    case 'weld-bevel':
      return bevel();
    case 'square':
      return { type: 'square', label: 'square', nodeId };
    case 'saddle':
      return { type: 'saddle', label: `saddle${branchOf ? ` (set-on ${branchOf})` : ''}`, nodeId };
    case 'mitre': {
      const b = bevel();
      const cut = Math.round((end.mitreCutDeg ?? 0) * 100) / 100;
      return {
        type: 'mitre',
        label: `mitre ${cut}°${b.type === 'square' ? '' : ` + ${b.label}`}`,
        nodeId,
        mitreCutDeg: end.mitreCutDeg ?? 0,
      };
    }
  }
}
