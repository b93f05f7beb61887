import { describe, expect, it } from 'vitest';
import { insertOnRun } from '../../../../src/features/editor/model/commands/insert-on-run';
import { setRunLength } from '../../../../src/features/editor/model/commands/edit-run';
import { effectiveNps } from '../../../../src/features/editor/model/line-size';
import { errors, expectMm, extend, newModel, resultOf, startWithFlange, TABLE_EDITION_MM } from './editor-test-kit';
import type { EditorModel } from '../../../../src/features/editor/model/editor-model';

// ASME B16.9 concentric reducer H, large end NPS 6: 140 mm (shared reference §2, S).
// ASME B16.9 straight tee C = M, NPS 6: 143 mm (S). ASME B16.5 Class 150 WN Y NPS 6 ≈ 89 mm.
const H6 = 140;
const C6 = 143;
const Y6 = 88.9;
const GAP = 3;

function firstRun(m: EditorModel) {
  return m.getSnapshot().design!.runs[0]!;
}

describe('insertOnRun', () => {
  it('puts a set-on branch part-way along a run and adds its branch with an open end', () => {
    const m = newModel();
    startWithFlange(m, '14');
    extend(m, 'east', 2000);
    const r = m.edit((d, ctx) =>
      insertOnRun(d, { runId: firstRun(m).id, distanceMm: 800, component: { kind: 'set-on-branch' }, branch: { direction: { x: 0, y: 0, z: 1 }, lengthMm: 450, nps: '6', end: { type: 'weld-neck-flange' } } }, ctx),
    );
    expect(r.ok).toBe(true);
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind).sort()).toEqual(['end', 'end', 'end', 'set-on-branch']);
    const header = d.runs.filter((x) => x.direction.x === 1);
    expect(header.map((x) => x.length.mm)).toEqual([800, 1200]);
    const branch = d.runs.find((x) => x.direction.z === 1)!;
    expect(branch.nps).toBe('6');
    expect(branch.length.kind).toBe('centre-to-face');
    // the header runs through unbroken: one piece over both runs
    const res = resultOf(m);
    expect(res.pieces.find((p) => p.runIds.length === 2)?.nps).toBe('14');
    expect(errors(m)).toEqual([]);
    // the new branch end is selected, ready to continue the branch
    expect(m.getSnapshot().selection).toEqual({ type: 'node', id: branch.to });
  });

  it('refuses a distance outside the run, a branch larger than its header and a too-shallow set-on', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const runId = firstRun(m).id;
    const before = m.getSnapshot().design;
    const attempts = [
      { distanceMm: 0 },
      { distanceMm: 1000 },
      { distanceMm: 400, nps: '8' as const },
      { distanceMm: 400, direction: { x: 1, y: 0.2, z: 0 } },
    ];
    for (const a of attempts) {
      const r = m.edit((d, ctx) =>
        insertOnRun(d, { runId, distanceMm: a.distanceMm, component: { kind: 'set-on-branch' }, branch: { direction: a.direction ?? { x: 0, y: 1, z: 0 }, lengthMm: 300, nps: a.nps ?? '4' } }, ctx),
      );
      expect(r.ok, JSON.stringify(a)).toBe(false);
    }
    expect(m.getSnapshot().design).toBe(before);
  });

  it('inserts a tee only with a square branch, and the tee takes C off both halves of the run', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const runId = firstRun(m).id;
    const skew = m.edit((d, ctx) => insertOnRun(d, { runId, distanceMm: 500, component: { kind: 'tee' }, branch: { direction: { x: 1, y: 1, z: 0 }, lengthMm: 300 } }, ctx));
    expect(skew.ok).toBe(false);
    const ok = m.edit((d, ctx) => insertOnRun(d, { runId, distanceMm: 500, component: { kind: 'tee' }, branch: { direction: { x: 0, y: 1, z: 0 }, lengthMm: 400 } }, ctx));
    expect(ok.ok).toBe(true);
    const res = resultOf(m);
    // P1: flange face to tee centre 500 − Y − C − 2 gaps
    expectMm(res.pieces[0]!.cutLengthMm, 500 - Y6 - C6 - 2 * GAP, TABLE_EDITION_MM);
    expect(errors(m)).toEqual([]);
  });

  it('changes size mid-run with a reducer: everything downstream takes the new size', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    extend(m, 'north', 1000);
    const d0 = m.getSnapshot().design!;
    // an explicit size downstream must follow the reducer rather than contradict it
    m.apply(() => ({ ok: true, design: { ...d0, runs: d0.runs.map((r, i) => (i === 1 ? { ...r, nps: '6' as const } : r)) }, label: 'state size' }));
    const r = m.edit((d, ctx) => insertOnRun(d, { runId: firstRun(m).id, distanceMm: 500, component: { kind: 'reducer', toNps: '4' } }, ctx));
    expect(r.ok).toBe(true);
    const d = m.getSnapshot().design!;
    const sizes = d.runs.map((run) => effectiveNps(d, run.id));
    expect(sizes).toEqual(['6', '4', '4']);
    const res = resultOf(m);
    expect(res.pieces.map((p) => p.nps)).toEqual(['6', '4', '4']);
    expect(errors(m)).toEqual([]);
    // piece before the reducer: 500 − Y − H/2 − 2 gaps (the reducer's work point is mid-length)
    expectMm(res.pieces[0]!.cutLengthMm, 500 - Y6 - H6 / 2 - 2 * GAP, TABLE_EDITION_MM);
  });

  it('moves everything downstream when an upstream dimension changes', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    extend(m, 'north', 800);
    extend(m, 'up', 600);
    const tip = m.getSnapshot().design!.nodes.at(-1)!.id;
    const before = resultOf(m).workPoints.find((w) => w.nodeId === tip)!.position;
    m.edit((d) => setRunLength(d, { runId: firstRun(m).id, lengthMm: 1250 }));
    const after = resultOf(m).workPoints.find((w) => w.nodeId === tip)!.position;
    expect(after.x - before.x).toBeCloseTo(250, 6);
    expect(after.y).toBeCloseTo(before.y, 6);
    expect(after.z).toBeCloseTo(before.z, 6);
  });
});
