import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import { design, EAST, elbow, NORTH, run, wn } from '../helpers/design-builder';

const so = (id: string): SpoolNode => ({ id, kind: 'end', end: { type: 'slip-on-flange' } });

// 24" Class 150 slip-on → pipe → LR 90 → weld neck, the first pipe `cut` mm long.
const slipOnToElbow = (cut: number) =>
  design(
    [so('s1'), elbow('e1'), wn('f2')],
    [run('r1', 's1', 'e1', EAST, cut, 'cut'), run('r2', 'e1', 'f2', NORTH, 2000, 'centre-to-face')],
    { nps: '24' },
  );

const codes = (r: ReturnType<typeof computeSpool>, code: string) => r.issues.filter((i) => i.code === code);

describe('pipe ending inside a slip-on hub', () => {
  it('a 60 mm pipe between a 24" slip-on and an LR 90 is an error naming the length needed', () => {
    // ASME B16.5 Class 150 NPS 24 slip-on: Y = 81 mm, raised face 2 mm (metric edition).
    // Setback = wall + 3 mm (common practice, no source): STD 9.53 mm (B36.10M) → 12.53 mm.
    // Pipe inside the flange: 81 + 2 − 12.53 = 70.47 mm, so a 60 mm pipe ends 10.47 mm
    // inside the hub. Hub fillet leg 1.4 × 9.53 = 13.34 mm (B31.3 Fig. 328.5.2B, from memory):
    // the pipe needs 83.81 mm.
    const r = computeSpool(slipOnToElbow(60));
    const e = codes(r, 'pipe-inside-hub');
    expect(e).toHaveLength(1);
    expect(e[0]!.severity).toBe('error');
    expect(e[0]!.message).toContain('10.5 mm inside the hub');
    expect(e[0]!.message).toContain('at least 83.8 mm');
    expect(e[0]!.message).not.toMatch(/\bs1\b|\be1\b/);
    expect(r.ok).toBe(false);
  });

  it('names the centre-to-face dimension needed when the run is dimensioned that way', () => {
    // Elbow take-off: NPS 24 LR 90° A = 914 mm (ASME B16.9); root gap 3 mm; setback 12.53 mm.
    // Centre-to-face for a 60 mm pipe: 60 + 914 + 3 + 12.53 = 989.53; needed 83.81 → 1013.34.
    const d = slipOnToElbow(0);
    d.runs[0] = run('r1', 's1', 'e1', EAST, 989.53, 'centre-to-face');
    const e = codes(computeSpool(d), 'pipe-inside-hub');
    expect(e).toHaveLength(1);
    expect(e[0]!.message).toContain('centre-to-face dimension at least 1013.3 mm');
  });

  it('is silent once the pipe clears the hub and its fillet', () => {
    expect(codes(computeSpool(slipOnToElbow(90)), 'pipe-inside-hub')).toEqual([]);
  });
});
