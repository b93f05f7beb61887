import { describe, expect, it } from 'vitest';
import { deleteComponent, deletionPreview } from '../../../../src/features/editor/model/commands/delete-component';
import { insertOnRun } from '../../../../src/features/editor/model/commands/insert-on-run';
import { IdAllocator } from '../../../../src/features/editor/model/id-allocator';
import type { EditorModel } from '../../../../src/features/editor/model/editor-model';
import { errors, extend, newModel, resultOf, startWithFlange } from './editor-test-kit';

/** 14" header east 2000 with a 6" set-on branch at 800 going up 450 then north 600; returns ids. */
function headerWithBranch(m: EditorModel) {
  startWithFlange(m, '14');
  extend(m, 'east', 2000);
  const header = m.getSnapshot().design!.runs[0]!.id;
  m.edit((d, ctx) =>
    insertOnRun(d, { runId: header, distanceMm: 800, component: { kind: 'set-on-branch' }, branch: { direction: { x: 0, y: 0, z: 1 }, lengthMm: 450, nps: '6' } }, ctx),
  );
  const d = m.getSnapshot().design!;
  const branchNode = d.nodes.find((n) => n.kind === 'set-on-branch')!.id;
  const branchEnd = d.runs.find((r) => r.from === branchNode && r.direction.z === 1)!.to;
  extend(m, 'north', 600, undefined, branchEnd);
  return { header, branchNode, branchElbow: branchEnd };
}

describe('deleteComponent', () => {
  it("deleting a branch's parent removes its whole subtree and joins the header again", () => {
    const m = newModel();
    const ids = headerWithBranch(m);
    const before = m.getSnapshot().design!;
    expect(before.nodes).toHaveLength(5);
    const preview = deletionPreview(before, ids.branchNode, { result: m.getResult(), ids: new IdAllocator(before) });
    // the set-on, its branch runs, the branch elbow and its end all go
    expect(preview.removedIds).toContain(ids.branchNode);
    expect(preview.removedIds).toContain(ids.branchElbow);
    const r = m.edit((d, ctx) => deleteComponent(d, { id: ids.branchNode }, ctx));
    expect(r.ok && r.removedIds.length).toBeGreaterThanOrEqual(5);
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'end']);
    expect(d.runs).toHaveLength(1);
    expect(d.runs[0]!.length).toEqual({ mm: 2000, kind: 'centre-to-face' });
    expect(r.ok && r.label).toMatch(/downstream/);
    expect(errors(m)).toEqual([]);
  });

  it('deleting an elbow cuts the line there: everything after it goes and it becomes an open end', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    extend(m, 'north', 800);
    extend(m, 'up', 500);
    const elbow = m.getSnapshot().design!.nodes.find((n) => n.kind === 'elbow')!.id;
    const r = m.edit((d, ctx) => deleteComponent(d, { id: elbow }, ctx));
    expect(r.ok).toBe(true);
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'end']);
    expect(d.nodes[1]!.id).toBe(elbow);
    expect(d.runs[0]!.length.kind).toBe('centre-to-face');
    expect(errors(m)).toEqual([]);
  });

  it('deleting an open end removes its run and the elbow behind it becomes the end', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    extend(m, 'north', 800);
    const tip = m.getSnapshot().design!.nodes.at(-1)!.id;
    m.edit((d, ctx) => deleteComponent(d, { id: tip }, ctx));
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'end']);
    expect(resultOf(m).pieces).toHaveLength(1);
  });

  it('refuses to delete the header run past a set-on branch, and the only component', () => {
    const m = newModel();
    const ids = headerWithBranch(m);
    const d = m.getSnapshot().design!;
    const past = d.runs.find((r) => r.from === ids.branchNode && r.direction.x === 1)!.id;
    const r = m.edit((dd, ctx) => deleteComponent(dd, { id: past }, ctx));
    expect(r.ok).toBe(false);
    expect(m.getSnapshot().design).toBe(d);
    const lone = newModel();
    startWithFlange(lone);
    const only = lone.getSnapshot().design!.nodes[0]!.id;
    expect(lone.edit((dd, ctx) => deleteComponent(dd, { id: only }, ctx)).ok).toBe(false);
  });

  it('deleting the branch end next to a tee turns the tee back into a straight run', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    const runId = m.getSnapshot().design!.runs[0]!.id;
    m.edit((d, ctx) => insertOnRun(d, { runId, distanceMm: 400, component: { kind: 'tee' }, branch: { direction: { x: 0, y: -1, z: 0 }, lengthMm: 300 } }, ctx));
    const branchEnd = m.getSnapshot().design!.nodes.at(-1)!.id;
    m.edit((d, ctx) => deleteComponent(d, { id: branchEnd }, ctx));
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'end']);
    expect(d.runs[0]!.length.mm).toBe(1000);
  });

  it('deleting the start end makes the next elbow the start', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1000);
    extend(m, 'north', 800);
    const start = m.getSnapshot().design!.nodes[0]!.id;
    const r = m.edit((d, ctx) => deleteComponent(d, { id: start }, ctx));
    expect(r.ok).toBe(true);
    const d = m.getSnapshot().design!;
    expect(d.nodes).toHaveLength(2);
    expect(d.nodes.every((n) => n.kind === 'end')).toBe(true);
    expect(errors(m)).toEqual([]);
  });
});
