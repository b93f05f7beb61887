import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import { minMitreRadiusMm } from '../../../../shared/engine/mitre-rules';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';
import { between, design, EAST, NORTH, run, wn } from '../helpers/design-builder';

const mitre = (id: string, welds: number): SpoolNode => ({
  id,
  kind: 'elbow',
  radius: 'long',
  construction: 'mitre',
  mitreWelds: welds,
});

const mitred = (deg: number, welds: number, nps = '2', spec: SpecOverrides = {}) =>
  design(
    [wn('f1'), mitre('m1', welds), wn('f2')],
    [
      run('r1', 'f1', 'm1', EAST, 800, 'centre-to-face'),
      run('r2', 'm1', 'f2', between(EAST, NORTH, deg), 800, 'centre-to-face'),
    ],
    { nps, ...spec },
  );

const codes = (r: ReturnType<typeof computeSpool>, code: string) => r.issues.filter((i) => i.code === code);

describe('mitre segment length', () => {
  it('refuses seven 12 mm segments on a 2" 90° mitre (8 welds) against the shop\'s 50 mm shortest piece', () => {
    // Radius 76 mm (ASME B16.9 NPS 2 LR A); segment = 2·76·tan(90/8/2) − 3 mm root gap = 11.97 mm.
    // 50 mm minimum piece: the built-in default (common practice, no source).
    const r = computeSpool(mitred(90, 8));
    const e = codes(r, 'mitre-segment-short');
    expect(e).toHaveLength(1);
    expect(e[0]!.severity).toBe('error');
    expect(e[0]!.message).toContain('7 middle segments would be 12 mm');
    expect(e[0]!.message).toContain('50 mm');
    expect(r.ok).toBe(false);
  });

  it('accepts a 10" 90° mitre with 2 welds (one 45° segment, well over the minimum)', () => {
    // NPS 10 LR A = 381 mm (ASME B16.9): segment = 2·381·tan 22.5° − 3 = 312.6 mm.
    const r = computeSpool(mitred(90, 2, '10'));
    expect(codes(r, 'mitre-segment-short')).toEqual([]);
    expect(codes(r, 'mitre-outside-code')).toEqual([]);
  });

  it('follows the shop minimum piece', () => {
    expect(codes(computeSpool(mitred(90, 8, '2', { minPieceLengthMm: 10 })), 'mitre-segment-short')).toEqual(
      [],
    );
  });
});

describe('ASME B31.3 mitre limits (warnings: the engineer of record decides)', () => {
  it('warns on a single mitre cut over 22.5° (a 60° change of direction at one joint)', () => {
    // ASME B31.3 304.2.3 / 306.3: single mitre θ ≤ 22.5° for full-rated service.
    const r = computeSpool(mitred(60, 1, '6'));
    const w = codes(r, 'mitre-outside-code');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.message).toContain('30°');
    expect(w[0]!.message).toContain('engineer of record');
  });

  it('is silent on a single mitre cut at exactly 22.5° (45° change of direction)', () => {
    expect(codes(computeSpool(mitred(45, 1, '6')), 'mitre-outside-code')).toEqual([]);
  });

  it('least effective radius, B31.3 eq. (5): R1 = A / tan θ + D / 2 (A from memory)', () => {
    // NPS 2 STD: T 3.91 mm (A = 25), D 60.3 mm, θ = 5.625°: 25 / 0.09849 + 30.15 = 283.98 mm.
    expect(minMitreRadiusMm(5.625, 3.91, 60.3)).toBeCloseTo(283.98, 1);
    // T 15 mm: A = 2T = 30; θ 22.5°: 30 / 0.41421 + 100 = 172.43 mm.
    expect(minMitreRadiusMm(22.5, 15, 200)).toBeCloseTo(172.43, 1);
    // T 24 mm: A = 2T/3 + 30 = 46; θ 22.5°: 46 / 0.41421 + 100 = 211.05 mm.
    expect(minMitreRadiusMm(22.5, 24, 200)).toBeCloseTo(211.05, 1);
  });

  it('warns when the 8-weld 2" mitre is laid out tighter than that radius', () => {
    const w = codes(computeSpool(mitred(90, 8, '2', { minPieceLengthMm: 10 })), 'mitre-outside-code');
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toContain('284 mm');
  });
});
