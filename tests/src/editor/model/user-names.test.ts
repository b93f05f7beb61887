import { describe, expect, it } from 'vitest';
import { deleteComponent } from '../../../../src/features/editor/model/commands/delete-component';
import { setEnd } from '../../../../src/features/editor/model/commands/edit-node';
import { userNames } from '../../../../src/features/editor/model/user-names';
import { extend, newModel, resultOf, startWithFlange } from './editor-test-kit';

/** Node ids (n1…) and run ids (r1…) the editor hands out; none may reach a user. */
const INTERNAL_ID = /\b[nr]\d+\b/;

function built() {
  const m = newModel();
  startWithFlange(m, '6');
  extend(m, 'east', 1000);
  extend(m, 'north', 800);
  return m;
}

describe('userNames', () => {
  it('names components by shop mark and runs by their two ends', () => {
    const m = built();
    const names = userNames(resultOf(m), m.getSnapshot().design);
    const d = m.getSnapshot().design!;
    expect(names.node('n1')).toBe('F1');
    expect(names.node(d.nodes.find((n) => n.kind === 'elbow')!.id)).toBe('E1');
    expect(names.run(d.runs[0]!.id)).toBe('F1–E1');
    expect(names.node('nope')).toBe('component');
    const begun = newModel();
    startWithFlange(begun, '6');
    expect(userNames(resultOf(begun), begun.getSnapshot().design).node('n1')).toBe('the start');
  });

  it('rewrites ids inside engine messages and weld descriptions, leaving P# and W# alone', () => {
    const m = built();
    const r = resultOf(m);
    const names = userNames(r, m.getSnapshot().design);
    expect(names.text('Run r1: 300 mm is 41 mm less than the fittings take up')).toBe('Run F1–E1: 300 mm is 41 mm less than the fittings take up');
    expect(names.text('Elbow n2 is cut from a 90° elbow at n2.')).toBe('Elbow E1 is cut from a 90° elbow at E1.');
    for (const w of r.welds) expect(names.text(w.joins)).not.toMatch(INTERNAL_ID);
    expect(names.text('P1 to W2')).toBe('P1 to W2');
  });

  it('the model states command labels and refusals in marks, not ids', () => {
    const m = built();
    const d = m.getSnapshot().design!;
    const tip = d.nodes.filter((n) => n.kind === 'end').at(-1)!.id;
    m.edit((x) => setEnd(x, { nodeId: tip, end: { type: 'weld-neck-flange' } }));
    expect(m.getSnapshot().lastMessage).toBe('Make OE1 a weld-neck flange');
    const elbow = d.nodes.find((n) => n.kind === 'elbow')!.id;
    m.edit((x, ctx) => deleteComponent(x, { id: elbow }, ctx));
    expect(m.getSnapshot().lastMessage).not.toMatch(INTERNAL_ID);
    expect(m.getSnapshot().undoLabel).toMatch(/E1/);
    const other = built();
    const bend = other.getSnapshot().design!.nodes.find((n) => n.kind === 'elbow')!.id;
    other.edit((x) => setEnd(x, { nodeId: bend, end: { type: 'bevel' } }));
    expect(other.getSnapshot().lastError).toBe('Only an open end takes a flange, bevel or cap');
    // a refusal that names a component and a run, as commands word them
    const refused = other.edit(() => ({ ok: false, error: `Run r1 passes straight through elbow ${bend}` }));
    expect(refused).toEqual({ ok: false, error: 'Run F1–E1 passes straight through elbow E1' });
  });
});
