import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { componentMarks, markOf } from '../../../shared/engine/component-marks';
import type { SpoolNode } from '../../../shared/schemas/spool-design-node.schema';
import { bevel, design, EAST, elbow, NORTH, run, UP, wn } from './helpers/design-builder';

// Flange n1 → run → tee n2 (branch north to flange n5) → elbow n3 → reducer n6 → bevel n4.
const tee = (id: string): SpoolNode => ({ id, kind: 'tee' });
const reducer = (id: string): SpoolNode => ({ id, kind: 'reducer', toNps: '4' });
const sample = design(
  [wn('n1'), tee('n2'), elbow('n3'), reducer('n6'), bevel('n4'), wn('n5')],
  [
    run('r1', 'n1', 'n2', EAST, 600),
    run('r2', 'n2', 'n3', EAST, 600),
    run('r4', 'n2', 'n5', NORTH, 500),
    run('r3', 'n3', 'n6', UP, 600),
    run('r5', 'n6', 'n4', UP, 400),
  ],
  { nps: '6' },
);

describe('componentMarks', () => {
  const result = computeSpool(sample);

  it('marks every placed component once, with no internal id in any mark', () => {
    expect(result.ok).toBe(true);
    const marks = componentMarks(result);
    expect(marks.size).toBe(result.components.length);
    expect(new Set(marks.values()).size).toBe(marks.size);
    for (const m of marks.values()) expect(m).not.toMatch(/^n\d/);
  });

  it('gives F, T, E, R and OE marks by kind, numbered from 1 per prefix', () => {
    const marks = componentMarks(result);
    expect(marks.get('n2')).toBe('T1');
    expect(marks.get('n3')).toBe('E1');
    expect(marks.get('n6')).toBe('R1');
    expect(marks.get('n4')).toBe('OE1');
    expect([marks.get('n1'), marks.get('n5')].sort()).toEqual(['F1', 'F2']);
  });

  it('numbers flanges in the flange-details order, the order the sheet tags them F1, F2…', () => {
    const marks = componentMarks(result);
    result.flanges.forEach((f, i) => expect(marks.get(f.nodeId)).toBe(`F${i + 1}`));
  });

  it('is the same for the same design and says "component" for an unknown node', () => {
    expect([...componentMarks(computeSpool(sample))]).toEqual([...componentMarks(result)]);
    expect(markOf(componentMarks(result), 'zz')).toBe('component');
  });
});
