import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';

/**
 * A long zig-zag of elbows between two weld-neck flanges, NPS 6, `nodes` nodes in all: the
 * shape of design that once made sheet rendering grow faster than linearly. Over
 * MAX_DESIGN_NODES it cannot be stored through the API, only written to the database directly
 * (as designs stored before the limit were) or rendered directly.
 */
export function elbowChainDesign(nodes: number, mark = `CHAIN-${nodes}`): SpoolDesign {
  const dirs = [
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
    { x: 1, y: 0, z: 0 },
    { x: 0, y: -1, z: 0 },
  ];
  const list: SpoolDesign['nodes'] = [{ id: 'f1', kind: 'end', end: { type: 'weld-neck-flange' } }];
  for (let i = 1; i <= nodes - 2; i += 1) list.push({ id: `e${i}`, kind: 'elbow' });
  list.push({ id: 'f2', kind: 'end', end: { type: 'weld-neck-flange' } });
  const runs: SpoolDesign['runs'] = [];
  for (let i = 0; i < list.length - 1; i += 1) {
    runs.push({
      id: `r${i + 1}`,
      from: list[i]!.id,
      to: list[i + 1]!.id,
      direction: dirs[i % 4]!,
      length: {
        mm: 900 + (i % 5) * 50,
        kind: i === 0 || i === list.length - 2 ? 'centre-to-face' : 'centre-to-centre',
      },
    });
  }
  return {
    format: 'tackline.spool',
    version: 1,
    mark,
    spec: { nps: '6' },
    origin: { x: 0, y: 0, z: 0 },
    nodes: list,
    runs,
  };
}
