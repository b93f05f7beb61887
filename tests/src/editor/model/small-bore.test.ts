import { describe, expect, it } from 'vitest';
import { insertOnRun } from '../../../../src/features/editor/model/commands/insert-on-run';
import { extendRun } from '../../../../src/features/editor/model/commands/extend-run';
import { deleteComponent } from '../../../../src/features/editor/model/commands/delete-component';
import { setNodeProperties } from '../../../../src/features/editor/model/commands/edit-node';
import { errors, extend, newModel, resultOf, startWithFlange } from './editor-test-kit';

describe('sockets and outlets on a header', () => {
  it('puts an open 1" socket on a 6" header at a stated orientation, then grows its branch from it', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 2000);
    const header = m.getSnapshot().design!.runs[0]!.id;
    const r = m.edit((d, ctx) => insertOnRun(d, { runId: header, distanceMm: 600, component: { kind: 'half-coupling', branchNps: '1', orientationDeg: 90 } }, ctx));
    expect(r.ok).toBe(true);
    const socket = m.getSnapshot().design!.nodes.find((n) => n.kind === 'half-coupling')!;
    expect(socket.kind === 'half-coupling' && socket.orientationDeg).toBe(90);
    expect(errors(m)).toEqual([]);
    const shape = resultOf(m).components.find((c) => c.nodeId === socket.id)!.shape;
    expect(shape.type === 'branch-connection' && shape.orientationDeg).toBe(90);

    // Orientation is a property like any other, checked against the document schema.
    expect(m.edit((d) => setNodeProperties(d, { nodeId: socket.id, patch: { orientationDeg: 10_000 } })).ok).toBe(false);

    // A branch pipe from the open socket: square to the header, at the socket's size.
    const branch = m.edit((d, ctx) => extendRun(d, { fromNodeId: socket.id, direction: { x: 0, y: -1, z: 0 }, lengthMm: 300 }, ctx));
    expect(branch.ok).toBe(true);
    const run = m.getSnapshot().design!.runs.find((x) => x.from === socket.id && x.direction.y === -1)!;
    expect(run.nps).toBe('1');
    expect(resultOf(m).pieces.some((p) => p.nps === '1')).toBe(true);

    // Deleting the socket joins the header again and takes the branch with it.
    const del = m.edit((d, ctx) => deleteComponent(d, { id: socket.id }, ctx));
    expect(del.ok).toBe(true);
    expect(m.getSnapshot().design!.runs).toHaveLength(1);
    expect(m.getSnapshot().design!.runs[0]!.length.mm).toBe(2000);
  });

  it('puts a branch outlet with the maker\'s height and refuses one larger than the header', () => {
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 2000);
    const header = m.getSnapshot().design!.runs[0]!.id;
    const tooBig = m.edit((d, ctx) =>
      insertOnRun(d, { runId: header, distanceMm: 600, component: { kind: 'branch-outlet', branchNps: '8', outletEnd: 'butt', heightMm: 60 }, branch: { direction: { x: 0, y: 0, z: 1 }, lengthMm: 300 } }, ctx),
    );
    expect(tooBig.ok).toBe(false);
    const ok = m.edit((d, ctx) => insertOnRun(d, { runId: header, distanceMm: 600, component: { kind: 'branch-outlet', branchNps: '2', outletEnd: 'socket', heightMm: 45, orientationDeg: 0 } }, ctx));
    expect(ok.ok).toBe(true);
    expect(resultOf(m).components.some((c) => c.kind === 'branch-outlet')).toBe(true);
  });
});
