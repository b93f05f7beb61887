import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';

const load = (f: string): unknown => JSON.parse(readFileSync(`samples/${f}`, 'utf8'));
const SAMPLES = readdirSync('samples').filter((f) => f.endsWith('.json'));

describe('samples', () => {
  it.each(SAMPLES)('%s computes with no errors', (f) => {
    const r = computeSpool(load(f));
    expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
    expect(r.pieces.length).toBeGreaterThan(0);
    expect(r.weights.emptyKg).toBeGreaterThan(0);
  });

  it('never mutates the design it is given (a deep-frozen design computes the same)', () => {
    const deepFreeze = (v: unknown): unknown => {
      if (v && typeof v === 'object') {
        for (const x of Object.values(v)) deepFreeze(x);
        Object.freeze(v);
      }
      return v;
    };
    for (const f of SAMPLES) {
      const plain = computeSpool(load(f));
      const frozen = computeSpool(deepFreeze(load(f)));
      expect(frozen).toEqual(plain);
      expect(frozen.issues.some((i) => i.code === 'internal-error')).toBe(false);
    }
    // Trusted designs skip zod's copy, so they are the real test of purity.
    const d = deepFreeze(load('cw-201-s03-return-14in.json'));
    expect(computeSpool(d, { trusted: true }).ok).toBe(true);
  });

  it('gives the same numbers unrounded, to within the rounding', () => {
    const d = load('cw-305-s01-rolling-offset-10in.json');
    const a = computeSpool(d);
    const b = computeSpool(d, { round: false });
    a.pieces.forEach((p, i) => expect(b.pieces[i]!.cutLengthMm!).toBeCloseTo(p.cutLengthMm!, 3));
    expect(b.weights.emptyKg).toBeCloseTo(a.weights.emptyKg, 3);
  });

  it('CW-201-S03: the close-coupled return is 2 × 533 + 3 mm and the header is one piece past the branch', () => {
    const r = computeSpool(load('cw-201-s03-return-14in.json'));
    expect(r.runs.find((x) => x.runId === 'R3')!.workPointDistanceMm).toBe(1069);
    expect(r.pieces.find((p) => p.runIds.includes('R1'))!.runIds).toEqual(['R1', 'R2']);
    expect(r.welds.map((w) => w.type)).toEqual([
      'flange',
      'butt',
      'butt',
      'butt',
      'flange',
      'branch',
      'flange',
    ]);
    // Diameter-inches: five 14" welds and two 6" welds.
    expect(r.diameterInches).toBe(5 * 14 + 2 * 6);
    expect(r.flanges.every((f) => f.straddles)).toBe(true);
  });

  it('CW-410-S02: three half couplings at 0°, 90° and 180°, header as one piece', () => {
    const r = computeSpool(load('cw-410-s02-header-6in.json'));
    const orientations = r.components.flatMap((c) =>
      c.shape.type === 'branch-connection' ? [c.shape.orientationDeg] : [],
    );
    expect(orientations).toEqual([0, 90, 180]);
    expect(r.pieces).toHaveLength(1);
    expect(r.pieces[0]!.cutLengthMm).toBe(2100 - 2 * (87 + 2) - 2 * 3);
  });

  it('CW-522-S04: a three-piece mitre adds one segment of 2R·tan 22.5° − gap', () => {
    const r = computeSpool(load('cw-522-s04-tee-mitre-10in.json'));
    const seg = r.pieces.find((p) => p.nodeId === 'M1')!;
    expect(seg.cutLengthMm).toBeCloseTo(2 * 381 * Math.tan(Math.PI / 8) - 2.5, 3);
    // Two welds deflect 45° each: every mitre end is cut 22.5° from square.
    expect(seg.ends.map((e) => e.mitreCutDeg)).toEqual([22.5, 22.5]);
    expect(r.bom.items.some((i) => i.description.startsWith('NPS 10 Flange blind'))).toBe(true);
  });
});
