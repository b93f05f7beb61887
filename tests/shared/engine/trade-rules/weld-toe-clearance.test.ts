import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';
import { design, EAST, plain, run, UP, wn } from '../helpers/design-builder';

const setOn = (id: string): SpoolNode => ({ id, kind: 'set-on-branch' });
const half = (id: string): SpoolNode =>
  ({ id, kind: 'half-coupling', branchNps: '1', orientationDeg: 0 }) as SpoolNode;

// 8" header from a weld-neck flange, a 4" set-on branch `d` mm of pipe from the flange's
// pipe end. ASME B16.5 Class 150 NPS 8 weld neck Y 100 mm + 2 mm raised face = 102 mm
// take-off; root gap 3 mm: centre-to-face = 102 + 3 + d.
const nearFlange = (d: number, spec: SpecOverrides = {}) =>
  design(
    [wn('f1'), setOn('b1'), wn('f2'), plain('x')],
    [
      run('r1', 'f1', 'b1', EAST, 105 + d, 'centre-to-face'),
      run('r2', 'b1', 'f2', EAST, 800, 'centre-to-face'),
      run('r3', 'b1', 'x', UP, 400, 'centre-to-centre', { nps: '4' }),
    ],
    { nps: '8', ...spec },
  );

const codes = (r: ReturnType<typeof computeSpool>, code: string) => r.issues.filter((i) => i.code === code);

describe('weld toe clearance (common practice, no source: 50 mm default)', () => {
  // Toe positions (common practice, no source): 8" STD wall 8.18 mm (B36.10M) → the girth
  // weld cap reaches 8.18·tan 37.5° + 1.6 = 7.88 mm from the pipe end; the 4" set-on's toe
  // lies r + wall = 57.15 + 6.02 = 63.17 mm from its centre. Clearance = d − 71.05 mm (printed to 0.1 mm).
  it('warns when a 4" set-on weld overlaps the weld-neck girth weld (65 mm of pipe: 6.05 mm overlap)', () => {
    const r = computeSpool(nearFlange(65));
    expect(codes(r, 'overlapping-fittings')).toEqual([]);
    const w = codes(r, 'weld-toes-close');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.message).toContain('overlap by 6 mm');
    const branchWeld = r.welds.find((x) => x.type === 'branch')!;
    const girth = r.welds.find((x) => x.nodeId === 'f1')!;
    expect(w[0]!.message).toContain(branchWeld.mark);
    expect(w[0]!.message).toContain(girth.mark);
    expect(w[0]!.message).not.toMatch(/\bb1\b|\bf1\b/);
  });

  it('warns at 80 mm of pipe (toes 9 mm apart) and is silent at 130 mm (59 mm apart)', () => {
    const w = codes(computeSpool(nearFlange(80)), 'weld-toes-close');
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toContain('are 9 mm apart');
    expect(codes(computeSpool(nearFlange(130)), 'weld-toes-close')).toEqual([]);
  });

  it('follows the shop minimum', () => {
    expect(codes(computeSpool(nearFlange(80, { minWeldToeClearanceMm: 5 })), 'weld-toes-close')).toEqual([]);
  });

  it('checks two half couplings on one header against each other', () => {
    // NPS 1 half coupling: outside B + 2C = 33.9 + 2 × 5.69 = 45.28 mm (ASME B16.11
    // Class 3000), toe one socket wall beyond: 22.64 + 5.69 = 28.33 mm each side.
    // 40 mm apart → overlap 16.7 mm; 150 mm apart → 93.3 mm clear.
    const two = (cc: number) =>
      design(
        [wn('f1'), half('c1'), half('c2'), wn('f2')],
        [
          run('r1', 'f1', 'c1', EAST, 500, 'centre-to-face'),
          run('r2', 'c1', 'c2', EAST, cc),
          run('r3', 'c2', 'f2', EAST, 500, 'centre-to-face'),
        ],
        { nps: '6' },
      );
    const w = codes(computeSpool(two(40)), 'weld-toes-close');
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toContain('overlap by 16.7 mm');
    expect(codes(computeSpool(two(150)), 'weld-toes-close')).toEqual([]);
  });
});
