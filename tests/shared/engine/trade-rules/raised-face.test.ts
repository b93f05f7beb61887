import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import { design, EAST, run, wn } from '../helpers/design-builder';

describe('raised-face height shown beside the flange take-off', () => {
  it('gives each flange the raised face its take-off includes (2 mm, B16.5 metric tables)', () => {
    // ASME B16.5-2003+ metric tables: Class 150/300 raised face 2 mm, excluded from Y; the
    // weld-neck take-off is Y + raised face. NPS 6 Class 150 weld neck Y = 87 mm (B16.5
    // Class 150 metric table) → take-off 89 mm.
    const r = computeSpool(
      design([wn('f1'), wn('f2')], [run('r1', 'f1', 'f2', EAST, 1000, 'face-to-face')], { nps: '6' }),
    );
    for (const f of r.flanges) expect(f.raisedFaceMm).toBe(2);
    const c = r.components.find((x) => x.nodeId === 'f1')!;
    expect(c.shape).toMatchObject({ type: 'flange', raisedFaceMm: 2 });
    expect(r.runs[0]!.takeOffFromMm).toBeCloseTo(87 + 2, 6);
  });
});
