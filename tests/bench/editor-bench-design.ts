import { computeSpool } from '../../shared/engine/compute-spool';
import type { SpoolDesign } from '../../shared/schemas/spool-design.schema';
import { EditorModel } from '../../src/features/editor/model/editor-model';
import { beginLine } from '../../src/features/editor/model/commands/start-spool';
import { extendRun } from '../../src/features/editor/model/commands/extend-run';
import { insertOnRun } from '../../src/features/editor/model/commands/insert-on-run';
import { setEnd } from '../../src/features/editor/model/commands/edit-node';
import { SPOOL_DESIGN_FORMAT, SPOOL_DESIGN_VERSION } from '../../shared/schemas/spool-design.schema';

/**
 * A large made-up spool for the benchmark, built with the editor's own commands: a 6"
 * serpentine header (east, north, west, north…) with a 2" set-on branch on every other
 * long run, until it holds at least `components` nodes. Bigger than any real spool; it
 * stresses the engine, the lists and the scene together.
 */
export function benchmarkDesign(components = 300): SpoolDesign {
  const m = new EditorModel((d) => computeSpool(d, { trusted: true }), {
    design: {
      format: SPOOL_DESIGN_FORMAT,
      version: SPOOL_DESIGN_VERSION,
      mark: 'BENCH-300',
      origin: { x: 0, y: 0, z: 0 },
      nodes: [{ id: 'n1', kind: 'end', end: { type: 'bevel' } }],
      runs: [],
    },
  });
  const must = (r: { ok: boolean; error?: string }) => {
    if (!r.ok) throw new Error(r.error);
  };
  must(m.edit((d) => beginLine(d, { nps: '6', end: { type: 'weld-neck-flange' } })));
  const legs = [
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
    { x: -1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
  ];
  let i = 0;
  while (m.getSnapshot().design!.nodes.length < components) {
    const d = m.getSnapshot().design!;
    const tip = d.nodes.filter((n) => n.kind === 'end').at(-1)!.id;
    const dir = legs[i % 4]!;
    const long = dir.y === 0;
    must(m.edit((dd, ctx) => extendRun(dd, { fromNodeId: tip, direction: dir, lengthMm: long ? 3000 : 1200 }, ctx)));
    if (long && i % 2 === 0) {
      const run = m.getSnapshot().design!.runs.at(-1)!;
      must(
        m.edit((dd, ctx) =>
          insertOnRun(dd, { runId: run.id, distanceMm: 1500, component: { kind: 'set-on-branch' }, branch: { direction: { x: 0, y: 0, z: 1 }, lengthMm: 400, nps: '2' } }, ctx),
        ),
      );
    }
    i++;
  }
  const last = m.getSnapshot().design!.nodes.filter((n) => n.kind === 'end')[1]!;
  must(m.edit((d) => setEnd(d, { nodeId: last.id, end: { type: 'weld-neck-flange' } })));
  return m.getSnapshot().design!;
}
