/**
 * Texts users see (issue messages, component descriptions, welds' `joins`) name components by
 * their shop marks, never by the design's internal ids (editor-style `n1`, `r1`).
 */
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { componentMarks } from '../../../shared/engine/component-marks';
import type { SpoolResult } from '../../../shared/engine/compute-result';
import { EAST, NORTH, UP, design, elbow, run, wn } from './helpers/design-builder';

const ID = /\b[nr]\d+\b/;

function texts(r: SpoolResult): string[] {
  return [
    ...r.issues.map((i) => i.message),
    ...r.components.map((c) => c.description),
    ...r.welds.map((w) => w.joins),
    ...r.weights.notIncluded,
  ];
}

describe('user-visible texts carry shop marks, not ids', () => {
  // NPS 6 LR 90° elbow take-off 229 mm (ASME B16.9 dimension A): 100 mm centre-to-centre
  // from a weld-neck flange face cannot hold the elbow, so the fittings overlap.
  const d = design(
    [wn('n1', { boltRotationDeg: 7 }), elbow('n2'), elbow('n3'), wn('n4', { boltRotationDeg: 13 })],
    [
      run('r1', 'n1', 'n2', EAST, 100, 'centre-to-face'),
      run('r2', 'n2', 'n3', NORTH, 1000),
      run('r3', 'n3', 'n4', UP, 240, 'centre-to-face'),
    ],
    { nps: '6' },
  );
  const r = computeSpool(d);
  const marks = componentMarks(r);

  it('has the failing checks this test is about', () => {
    expect(r.issues.some((i) => i.code === 'overlapping-fittings')).toBe(true);
  });

  it('no message, description or weld joins names an internal id', () => {
    for (const t of texts(r)) expect(t).not.toMatch(ID);
    for (const t of texts(r)) expect(t).not.toMatch(/[\uE000\uE001]/);
  });

  it('each issue about a component names that component by its mark', () => {
    for (const i of r.issues) {
      const mark = i.componentId ? marks.get(i.componentId) : undefined;
      if (mark) expect(i.message).toContain(mark);
    }
  });

  it('welds say which marks they join', () => {
    expect(r.welds.some((w) => w.joins.includes(marks.get('n2')!))).toBe(true);
  });
});
