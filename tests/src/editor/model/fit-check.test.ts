import { describe, expect, it } from 'vitest';
import { insertOnRun, type InsertOnRunArgs } from '../../../../src/features/editor/model/commands/insert-on-run';
import { extendRun } from '../../../../src/features/editor/model/commands/extend-run';
import { setEnd } from '../../../../src/features/editor/model/commands/edit-node';
import { PLANT_AXES } from '../../../../src/features/editor/model/plant-directions';
import type { EditorModel } from '../../../../src/features/editor/model/editor-model';
import { expectMm, extend, newModel, startWithFlange, TABLE_EDITION_MM } from './editor-test-kit';

// ASME B16.9 straight tee C, NPS 6: 143 mm; 90° LR elbow A, NPS 6: 229 mm; concentric
// reducer H, NPS 6: 140 mm (shared reference §2, S). ASME B16.5 Class 150 WN flange
// length through hub Y, NPS 6: 89 mm (≈ 88.9 in the editor kit's tests). Root gap 3 mm and
// shortest piece 50 mm: the built-in spec (common practice, no source).
const C6 = 143;
const A6 = 229;
const H6 = 140;
const Y6 = 88.9;
const GAP = 3;
const MIN_PIECE = 50;

function headerRun(m: EditorModel) {
  return m.getSnapshot().design!.runs[0]!;
}

function insertTee(m: EditorModel, distanceMm: number, accept = false) {
  const args: InsertOnRunArgs = {
    runId: headerRun(m).id,
    distanceMm,
    component: { kind: 'tee' },
    branch: { direction: PLANT_AXES.north.vector, lengthMm: 400 },
  };
  return m.edit((d, ctx) => insertOnRun(d, args, ctx), { fit: { what: 'the tee', accept } });
}

describe('fit check when a fitting is inserted', () => {
  it('holds back a tee too close to a flange and says how much length is missing', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const before = m.getSnapshot().design;
    const r = insertTee(m, 200);
    expect(r.ok).toBe(false);
    // nothing changed, the refusal names the shortfall in mm and by shop marks only
    expect(m.getSnapshot().design).toBe(before);
    const pending = m.getSnapshot().pendingFit!;
    expect(pending.misfits).toHaveLength(1);
    const miss = pending.misfits[0]!;
    expectMm(miss.neededMm, Y6 + C6 + 2 * GAP + MIN_PIECE, TABLE_EDITION_MM);
    expectMm(miss.missingMm, Y6 + C6 + 2 * GAP + MIN_PIECE - 200, TABLE_EDITION_MM);
    expect([miss.fromMark, miss.toMark]).toEqual(['F1', 'T1']);
    expect(pending.message).toMatch(/^The tee does not fit: the run from F1 to T1 is 200\.0 mm and needs 2\d\d\.\d mm .*: 8\d\.\d mm missing/);
    expect(pending.message).not.toMatch(/\bn\d|\br\d/);
    expect(m.getSnapshot().lastError).toBe(pending.message);
  });

  it('inserts it anyway when the user says so, and the engine still flags the run', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    insertTee(m, 200);
    const r = m.acceptPendingFit();
    expect(r.ok).toBe(true);
    const snap = m.getSnapshot();
    expect(snap.design!.nodes.some((n) => n.kind === 'tee')).toBe(true);
    expect(snap.pendingFit).toBeNull();
    expect(snap.lastMessage).toMatch(/does not fit/);
    expect(m.getResult()!.ok).toBe(false);
    // one undo step takes it out again
    m.undo();
    expect(m.getSnapshot().design!.nodes.some((n) => n.kind === 'tee')).toBe(false);
  });

  it('"insert anyway" is refused once the spool has changed, and cancel forgets it', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    insertTee(m, 200);
    extend(m, 'north', 500);
    expect(m.getSnapshot().pendingFit).toBeNull();
    expect(m.acceptPendingFit().ok).toBe(false);
    insertTee(m, 200);
    m.dismissPendingFit();
    expect(m.getSnapshot().pendingFit).toBeNull();
    expect(m.getSnapshot().lastError).toBeNull();
  });

  it('lets a tee that fits straight in, and states lengths in ft-in too for an inch shop', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    expect(insertTee(m, 400).ok).toBe(true);

    const inch = newModel();
    inch.setUnits('ft-in');
    startWithFlange(inch, '6');
    extend(inch, 'east', 1000);
    insertTee(inch, 200);
    // 200 mm = 7 7/8" (200 / 25.4 = 7.874 in → 7 14/16)
    expect(inch.getSnapshot().pendingFit!.message).toContain('200.0 mm (7 7/8")');
  });

  it('holds back a reducer that does not fit', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const r = m.edit(
      (d, ctx) => insertOnRun(d, { runId: headerRun(m).id, distanceMm: 150, component: { kind: 'reducer', toNps: '4' } }, ctx),
      { fit: { what: 'the reducer' } },
    );
    expect(r.ok).toBe(false);
    const miss = m.getSnapshot().pendingFit!.misfits[0]!;
    expectMm(miss.missingMm, Y6 + H6 / 2 + 2 * GAP + MIN_PIECE - 150, TABLE_EDITION_MM);
  });

  it('holds back the elbow made by turning from an end the run is too short for', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 250, 'centre-to-centre');
    const tip = m.getSnapshot().design!.nodes.find((n) => n.kind === 'end' && n.id !== 'n1')!.id;
    const r = m.edit(
      (d, ctx) => extendRun(d, { fromNodeId: tip, direction: PLANT_AXES.north.vector, lengthMm: 800 }, ctx),
      { fit: { what: 'the elbow' } },
    );
    expect(r.ok).toBe(false);
    const miss = m.getSnapshot().pendingFit!.misfits[0]!;
    expectMm(miss.missingMm, Y6 + A6 + 2 * GAP + MIN_PIECE - 250, TABLE_EDITION_MM);
    expect(miss.toMark).toBe('E1');
  });

  it('holds back a flange put on an end the run is too short for', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 600);
    extend(m, 'north', 330, 'centre-to-centre');
    const tip = m.getSnapshot().design!.nodes.filter((n) => n.kind === 'end').at(-1)!.id;
    // bevel first (fits: elbow A + one gap + 50 mm ≤ 330), then a flange (Y6 more: does not)
    expect(m.edit((d) => setEnd(d, { nodeId: tip, end: { type: 'bevel' } }), { fit: { what: 'the bevel end' } }).ok).toBe(true);
    const r = m.edit((d) => setEnd(d, { nodeId: tip, end: { type: 'weld-neck-flange' } }), { fit: { what: 'the flange' } });
    expect(r.ok).toBe(false);
    expectMm(m.getSnapshot().pendingFit!.misfits[0]!.missingMm, A6 + Y6 + 2 * GAP + MIN_PIECE - 330, TABLE_EDITION_MM);
  });

  it('does not blame a change for a run that did not fit before it', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    insertTee(m, 200);
    m.acceptPendingFit();
    const tipRun = m.getSnapshot().design!.runs.find((r) => r.direction.x === 1 && r.from !== 'n1')!;
    // a second, fitting tee further down: the old misfit is not this tee's fault
    const r = m.edit(
      (d, ctx) => insertOnRun(d, { runId: tipRun.id, distanceMm: 500, component: { kind: 'tee' }, branch: { direction: PLANT_AXES.south.vector, lengthMm: 400 } }, ctx),
      { fit: { what: 'the tee' } },
    );
    expect(r.ok).toBe(true);
  });
});
