import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { componentMarks, markOf } from '../../../shared/engine/component-marks';
import { computeSpool } from '../../../shared/engine/compute-spool';
import {
  earliestStageUndone,
  revisionDifferences,
  type RevisionDifference,
  type RevisionSide,
} from '../../../shared/engine/revision-diff';
import type { SpoolDesign } from '../../../shared/schemas/spool-design.schema';
import { formatMm } from '../../../shared/units/length-format';

// Change lists are the shop's own record of what a new revision asks of the bay: these tests
// check that each kind of edit a detailer can make is listed, with the stage it undoes
// (which stage each change undoes is common practice, no source).

function sample(name: string): SpoolDesign {
  return JSON.parse(readFileSync(new URL(`../../../samples/${name}`, import.meta.url), 'utf8')) as SpoolDesign;
}

function side(design: SpoolDesign): RevisionSide {
  const result = computeSpool(design);
  const marks = componentMarks(result);
  return { design, result, markOf: (id) => markOf(marks, id) };
}

function diff(a: SpoolDesign, b: SpoolDesign): RevisionDifference[] {
  return revisionDifferences(side(a), side(b), (mm) => formatMm(mm));
}

const header = sample('cw-410-s02-header-6in.json');
const ret = sample('cw-201-s03-return-14in.json');
const drop = sample('cw-118-s02-reducer-drop-10x6.json');

function edit(d: SpoolDesign, change: (copy: SpoolDesign) => void): SpoolDesign {
  const copy = structuredClone(d);
  change(copy);
  return copy;
}

function node<K extends SpoolDesign['nodes'][number]['kind']>(d: SpoolDesign, id: string, kind: K) {
  const n = d.nodes.find((x) => x.id === id);
  if (!n || n.kind !== kind) throw new Error(`no ${kind} ${id}`);
  return n as Extract<SpoolDesign['nodes'][number], { kind: K }>;
}

describe('revisionDifferences', () => {
  it('lists nothing for the same design', () => {
    for (const d of [header, ret, drop]) expect(diff(d, structuredClone(d))).toEqual([]);
  });

  it('lists an outlet turned 90° though no cut length, run or weld count changes', () => {
    const turned = edit(header, (d) => {
      node(d, 'C2', 'half-coupling').orientationDeg = 180;
    });
    const changes = diff(header, turned);
    expect(changes).toHaveLength(1);
    expect(changes[0]).toMatchObject({ subject: 'component', change: 'changed', undoes: 'fit' });
    expect(changes[0]!.text).toMatch(/orientation was 90° from top of pipe, now 180° from top of pipe/);
    // Users read shop marks, never the design's ids: the half couplings are O1–O3.
    expect(changes[0]!.item).toMatch(/^O\d$/);
  });

  it('states the zero of an outlet angle on a vertical header: plant north', () => {
    const vertical = edit(header, (d) => {
      for (const r of d.runs) r.direction = { x: 0, y: 0, z: 1 };
    });
    const turned = edit(vertical, (d) => {
      node(d, 'C2', 'half-coupling').orientationDeg = 180;
    });
    const [change] = diff(vertical, turned);
    expect(change!.text).toMatch(/orientation was 90° from plant north, now 180° from plant north/);
  });

  it('lists a changed fitting size and the pieces it changes', () => {
    const bigger = edit(header, (d) => {
      node(d, 'C1', 'half-coupling').branchNps = '2';
    });
    const changes = diff(header, bigger);
    const c = changes.find((x) => x.subject === 'component');
    expect(c?.text).toMatch(/size was NPS 1, now NPS 2/);
    expect(c?.undoes).toBe('cut');
    expect(earliestStageUndone(changes)).toBe('cut');
  });

  it('lists a changed fitting type (eccentric reducer made concentric) and a flipped flat side', () => {
    // The sample's reducer is eccentric, flat on top.
    const concentric = edit(drop, (d) => {
      const r = node(d, 'X1', 'reducer');
      r.type = 'concentric';
      delete r.flatSide;
    });
    const c = diff(drop, concentric).find((x) => x.subject === 'component' && x.item === 'R1');
    expect(c?.text).toMatch(/^R1: .*type was eccentric, now concentric/);
    expect(c?.undoes).toBe('cut');
    const flipped = edit(drop, (d) => {
      node(d, 'X1', 'reducer').flatSide = 'bottom';
    });
    const changes = diff(drop, flipped);
    const r = changes.find((x) => x.item === 'R1')!;
    expect(r.text).toBe('R1: flat side was top, now bottom.');
    expect(r.undoes).toBe('fit');
    // Flipping the flat side moves the line beyond it by the difference of the two radii.
    expect(changes.filter((x) => /moved/.test(x.text)).length).toBeGreaterThan(0);
  });

  it('lists a run lengthened: the run, its piece with old and new cut lengths, the moved components', () => {
    const longer = edit(header, (d) => {
      d.runs.find((r) => r.id === 'R4')!.length.mm += 100;
    });
    const a = side(header);
    const b = side(longer);
    const changes = revisionDifferences(a, b, (mm) => formatMm(mm));
    const piece = b.result.pieces.find(
      (p) => p.cutLengthMm !== a.result.pieces.find((q) => q.mark === p.mark)!.cutLengthMm,
    )!;
    const old = a.result.pieces.find((q) => q.mark === piece.mark)!.cutLengthMm!;
    expect(changes.map((c) => c.text)).toContain(
      `${piece.mark}: cut length was ${formatMm(old)}, now ${formatMm(piece.cutLengthMm!)}.`,
    );
    expect(changes.some((c) => c.subject === 'run' && /work-point length was 700\.0 mm, now 800\.0 mm/.test(c.text))).toBe(true);
    // The end flange moved 100 mm with the run.
    expect(changes.some((c) => c.subject === 'component' && /moved 100\.0 mm/.test(c.text))).toBe(true);
    expect(earliestStageUndone(changes)).toBe('cut');
  });

  it('lists a run turned to another direction and the components it moves', () => {
    const turned = edit(header, (d) => {
      d.runs.find((r) => r.id === 'R4')!.direction = { x: 1, y: 0, z: 0 };
    });
    const changes = diff(header, turned);
    expect(changes.some((c) => c.subject === 'run' && /direction turned 90°/.test(c.text))).toBe(true);
  });

  it('lists a spec change (root gap) and the cut lengths it changes', () => {
    const tighter = edit(ret, (d) => {
      d.spec = { ...d.spec, rootGapMm: 2 };
    });
    const changes = diff(ret, tighter);
    expect(changes[0]).toMatchObject({ subject: 'spec', item: 'root gap', undoes: 'cut' });
    expect(changes[0]!.text).toBe('Spool spec: root gap was 3.0 mm, now 2.0 mm.');
    expect(changes.filter((c) => c.subject === 'piece').length).toBeGreaterThan(0);
  });

  it('lists a flange whose bolt holes turn', () => {
    const rolled = edit(ret, (d) => {
      const f = node(d, 'F2', 'end');
      if (f.end.type !== 'weld-neck-flange') throw new Error('fixture');
      f.end.boltRotationDeg = 0;
      f.end.mustTwoHole = false;
    });
    const changes = diff(ret, rolled);
    const flange = changes.find((c) => c.subject === 'flange');
    expect(flange?.text).toMatch(/^F\d bolt holes: hole 1 was at [\d.]+°, now 0°\.$/);
    expect(flange?.undoes).toBe('fit');
    expect(earliestStageUndone(changes)).toBe('fit');
  });

  it('lists welds added, removed or changed (a flanged end made a field bevel)', () => {
    const bevelled = edit(header, (d) => {
      node(d, 'F2', 'end').end = { type: 'bevel', fieldWeld: true };
    });
    const changes = diff(header, bevelled);
    expect(changes.some((c) => c.subject === 'component' && /end was weld neck flange, now bevel/.test(c.text))).toBe(true);
    expect(changes.some((c) => c.subject === 'weld')).toBe(true);
  });

  it('lists a component added and one removed', () => {
    const fewer = edit(header, (d) => {
      // C3 goes: R3 runs straight on to F2.
      d.nodes = d.nodes.filter((n) => n.id !== 'C3');
      d.runs = d.runs.filter((r) => r.id !== 'R4');
      d.runs.find((r) => r.id === 'R3')!.to = 'F2';
      d.runs.find((r) => r.id === 'R3')!.length = { mm: 1200, kind: 'centre-to-face' };
    });
    const removed = diff(header, fewer);
    expect(removed.some((c) => c.subject === 'component' && c.change === 'removed' && /half coupling/.test(c.text))).toBe(true);
    const added = diff(fewer, header);
    expect(added.some((c) => c.subject === 'component' && c.change === 'added' && /half coupling/.test(c.text))).toBe(true);
  });

  it('never shows a design id that is not also a shop mark', () => {
    // Editor designs use ids like n7: none may reach a change line.
    const renamed = edit(header, (d) => {
      const ids = new Map(d.nodes.map((n, i) => [n.id, `n${i + 1}`]));
      d.nodes = d.nodes.map((n) => ({ ...n, id: ids.get(n.id)! }));
      d.runs = d.runs.map((r) => ({ ...r, id: `r${r.id}`, from: ids.get(r.from)!, to: ids.get(r.to)! }));
    });
    const turned = edit(renamed, (d) => {
      node(d, 'n3', 'half-coupling').orientationDeg = 270;
      d.runs[0]!.length.mm += 5;
    });
    const changes = diff(renamed, turned);
    expect(changes.length).toBeGreaterThan(0);
    for (const c of changes) expect(c.text).not.toMatch(/\bn\d+\b|\brR\d/);
  });
});

describe('earliestStageUndone', () => {
  it('is none with no changes, else the earliest stage any change undoes', () => {
    const d = (undoes: RevisionDifference['undoes']): RevisionDifference => ({
      subject: 'spec',
      item: 'x',
      change: 'changed',
      text: '',
      undoes,
    });
    expect(earliestStageUndone([])).toBe('none');
    expect(earliestStageUndone([d('none'), d('weld')])).toBe('weld');
    expect(earliestStageUndone([d('weld'), d('fit'), d('none')])).toBe('fit');
    expect(earliestStageUndone([d('fit'), d('cut')])).toBe('cut');
  });
});
