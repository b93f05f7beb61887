import { describe, expect, it } from 'vitest';
import { setEnd, setFlangeBoltRotation, setNodeProperties } from '../../../../src/features/editor/model/commands/edit-node';
import { setLineSize, setRunLength } from '../../../../src/features/editor/model/commands/edit-run';
import { deleteComponent } from '../../../../src/features/editor/model/commands/delete-component';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import { EditorModel } from '../../../../src/features/editor/model/editor-model';
import { extendTarget } from '../../../../src/features/editor/model/extend-target';
import { extend, newModel, resultOf, startWithFlange } from './editor-test-kit';

describe('EditorModel', () => {
  it('undoes and redoes each command, and a new command clears the redo stack', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const one = m.getSnapshot().design;
    extend(m, 'north', 500);
    const two = m.getSnapshot().design;
    expect(m.getSnapshot().undoLabel).toMatch(/North/);
    expect(m.undo()).toBe(true);
    expect(m.getSnapshot().design).toBe(one);
    expect(m.getSnapshot().canRedo).toBe(true);
    expect(m.redo()).toBe(true);
    expect(m.getSnapshot().design).toBe(two);
    m.undo();
    extend(m, 'south', 300);
    expect(m.getSnapshot().canRedo).toBe(false);
    while (m.undo());
    expect(m.getSnapshot().design).toBeNull();
  });

  it('joins keystroke-by-keystroke length edits of one run into one undo step', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const before = m.getSnapshot().design;
    const run = before!.runs[0]!.id;
    for (const mm of [1, 15, 150, 1500]) m.edit((d) => setRunLength(d, { runId: run, lengthMm: mm }), { coalesce: `length:${run}` });
    expect(m.getSnapshot().design!.runs[0]!.length.mm).toBe(1500);
    m.undo();
    expect(m.getSnapshot().design).toBe(before);
    m.redo();
    expect(m.getSnapshot().design!.runs[0]!.length.mm).toBe(1500);
    // A different command in between starts a new step.
    m.edit((d) => setRunLength(d, { runId: run, lengthMm: 1600 }), { coalesce: `length:${run}` });
    extend(m, 'north', 500);
    m.edit((d) => setRunLength(d, { runId: run, lengthMm: 1700 }), { coalesce: `length:${run}` });
    m.undo();
    expect(m.getSnapshot().design!.runs[0]!.length.mm).toBe(1600);
  });

  it('never hands a deleted id to a different component, even after undo', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    extend(m, 'north', 500);
    const tip = m.getSnapshot().design!.nodes.at(-1)!.id;
    m.edit((d, ctx) => deleteComponent(d, { id: tip }, ctx));
    extend(m, 'up', 400);
    const ids = m.getSnapshot().design!.nodes.map((n) => n.id);
    expect(ids).not.toContain(tip);
  });

  it('notifies subscribers and keeps the snapshot stable between changes', () => {
    const m = newModel();
    let calls = 0;
    const off = m.subscribe(() => calls++);
    const s0 = m.getSnapshot();
    expect(m.getSnapshot()).toBe(s0);
    startWithFlange(m);
    expect(calls).toBe(1);
    expect(m.getSnapshot()).not.toBe(s0);
    off();
    extend(m, 'east', 100);
    expect(calls).toBe(1);
  });

  it('computes the engine result once per design', () => {
    let runs = 0;
    const m = new EditorModel((d) => {
      runs++;
      return computeSpool(d);
    });
    startWithFlange(m);
    m.getResult();
    m.getResult();
    expect(runs).toBe(1);
    extend(m, 'east', 500);
    m.getResult();
    expect(runs).toBe(2);
  });

  it('is read-only for roles that may not edit: commands, undo and redo refuse', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const d = m.getSnapshot().design;
    m.setReadOnly(true);
    const r = m.edit((dd) => setRunLength(dd, { runId: dd.runs[0]!.id, lengthMm: 10 }));
    expect(r.ok).toBe(false);
    expect(m.undo()).toBe(false);
    expect(m.getSnapshot().design).toBe(d);
    expect(m.getSnapshot().canUndo).toBe(false);
    // but the viewer may still select and change the view
    m.select({ type: 'run', id: d!.runs[0]!.id });
    expect(m.getSnapshot().selection?.id).toBe(d!.runs[0]!.id);
  });

  it('ignores unknown ids, and undo restores the selection of before the command, never a vanished one', () => {
    const m = newModel();
    startWithFlange(m);
    const start = m.getSnapshot().design!.nodes[0]!.id;
    extend(m, 'east', 1000);
    m.select({ type: 'node', id: 'nope' });
    expect(m.getSnapshot().selection).toBeNull();
    m.select({ type: 'run', id: 'n1' });
    expect(m.getSnapshot().selection).toBeNull();
    const run = m.getSnapshot().design!.runs[0]!.id;
    m.select({ type: 'run', id: run });
    m.undo();
    expect(m.getSnapshot().selection).toEqual({ type: 'node', id: start });
    m.replaceDesign(null);
    expect(m.getSnapshot().selection).toBeNull();
  });

  it('validates property patches against the schema and refuses bad ones without changing anything', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    extend(m, 'north', 500);
    const elbow = m.getSnapshot().design!.nodes.find((n) => n.kind === 'elbow')!.id;
    const before = m.getSnapshot().design;
    expect(m.edit((d) => setNodeProperties(d, { nodeId: elbow, patch: { radius: 'huge' } })).ok).toBe(false);
    expect(m.edit((d) => setNodeProperties(d, { nodeId: elbow, patch: { kind: 'tee' } })).ok).toBe(false);
    expect(m.getSnapshot().design).toBe(before);
    expect(m.edit((d) => setNodeProperties(d, { nodeId: elbow, patch: { radius: 'short' } })).ok).toBe(true);
    // ASME B16.9 SR 90° A, NPS 6 = 152 mm (shared reference §2, S)
    const sr = resultOf(m).components.find((c) => c.nodeId === elbow)!;
    expect(sr.ends[0]!.takeOffMm).toBeCloseTo(152, 0);
  });

  it('sets flange bolt rotation and the engine reports the matching orientation and straddle check', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const flange = m.getSnapshot().design!.nodes[0]!.id;
    // ASME B16.5 Class 150 NPS 6: 8 bolts, so straddling puts the first hole 180/8 = 22.5° off the vertical.
    expect(resultOf(m).flanges[0]!.rotationDeg).toBeCloseTo(22.5, 6);
    m.edit((d) => setFlangeBoltRotation(d, { nodeId: flange, rotationDeg: 370 }));
    const f = resultOf(m).flanges[0]!;
    expect(f.rotationDeg).toBeCloseTo(10, 6);
    expect(f.straddles).toBe(false);
    expect(f.correction?.rotateClockwiseLookingAtFaceDeg).toBeCloseTo(12.5, 6);
    expect(m.edit((d) => setFlangeBoltRotation(d, { nodeId: flange, rotationDeg: null })).ok).toBe(true);
    expect(resultOf(m).flanges[0]!.straddles).toBe(true);
  });

  it('changes the end component and the line size', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const tip = m.getSnapshot().design!.nodes[1]!.id;
    expect(m.edit((d) => setEnd(d, { nodeId: tip, end: { type: 'weld-neck-flange' } })).ok).toBe(true);
    expect(resultOf(m).flanges).toHaveLength(2);
    const run = m.getSnapshot().design!.runs[0]!.id;
    expect(m.edit((d) => setLineSize(d, { runId: run, nps: '8' })).ok).toBe(true);
    expect(resultOf(m).pieces[0]!.nps).toBe('8');
    expect(m.getSnapshot().design!.spec?.nps).toBe('8');
  });

  it('finds the open end to grow from: selected end, end of a selected run, else the newest end', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const d = m.getSnapshot().design!;
    expect(extendTarget(d, null)).toBe(d.nodes[1]!.id);
    expect(extendTarget(d, { type: 'node', id: d.nodes[0]!.id })).toBe(d.nodes[0]!.id);
    expect(extendTarget(d, { type: 'run', id: d.runs[0]!.id })).toBe(d.nodes[1]!.id);
  });
});
