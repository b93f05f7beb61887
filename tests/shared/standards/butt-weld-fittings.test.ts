import { describe, expect, it } from 'vitest';
import {
  capDimensions,
  elbowDimensions,
  reducerDimensions,
  teeDimensions,
  type ElbowKind,
} from '../../../shared/standards/butt-weld-fittings';
import { NPS_VALUES, type Nps } from '../../../shared/standards/nps';

/** ASME B16.9 allows ±2 mm on A, B, C and M for NPS 1/2–24. */
const B169_TOL_MM = 2;

function value<T>(r: { ok: true; value: T } | { ok: false; missing: string }): T {
  if (!r.ok) throw new Error(r.missing);
  return r.value;
}

describe('elbowDimensions: LR 90° A (ASME B16.9)', () => {
  // Exact inch conversions from a fitting maker's B16.9 elbow catalogue (mm): ±2 mm tolerance.
  const catalogue: Array<[Nps, number]> = [
    ['1/2', 38.1],
    ['1', 38.1],
    ['1-1/4', 47.8],
    ['1-1/2', 57.2],
    ['2', 76.2],
    ['2-1/2', 95.2],
    ['3', 114.3],
    ['4', 152.4],
    ['5', 190.5],
    ['6', 228.6],
    ['8', 304.8],
    ['10', 381.0],
    ['12', 457.2],
    ['14', 533.4],
    ['16', 609.6],
    ['18', 685.8],
    ['20', 762.0],
    ['24', 914.4],
  ];
  it.each(catalogue)('NPS %s is within ±2 mm of the catalogue value %f mm', (nps, mm) => {
    expect(Math.abs(value(elbowDimensions(nps, 'LR90')).centreToEndMm - mm)).toBeLessThanOrEqual(B169_TOL_MM);
  });

  // B16.9 metric values via the weldolets dimension sheet and the wermac reducing-elbow table: exact.
  const metric: Array<[Nps, number]> = [
    ['1/2', 38],
    ['1', 38],
    ['2', 76],
    ['4', 152],
    ['5', 190],
    ['6', 229],
    ['8', 305],
    ['10', 381],
    ['12', 457],
    ['14', 533],
    ['16', 610],
    ['18', 686],
    ['20', 762],
    ['24', 914],
  ];
  it.each(metric)('NPS %s equals the tabulated metric A %i mm', (nps, mm) => {
    expect(value(elbowDimensions(nps, 'LR90')).centreToEndMm).toBe(mm);
  });

  it('keeps the NPS 1/2 anomaly: A = 38 mm, the same as NPS 1 (weldolets sheet and catalogue)', () => {
    expect(value(elbowDimensions('1/2', 'LR90')).centreToEndMm).toBe(
      value(elbowDimensions('1', 'LR90')).centreToEndMm,
    );
  });

  it('marks NPS 3/4 (29 mm, sources conflict with 38.1) as secondary and carries no 45° or return for it', () => {
    expect(value(elbowDimensions('3/4', 'LR90'))).toMatchObject({ centreToEndMm: 29, status: 'S~' });
    expect(elbowDimensions('3/4', 'LR45').ok).toBe(false);
    expect(elbowDimensions('3/4', 'LR180').ok).toBe(false);
  });

  it('uses A as the bend radius for long-radius kinds', () => {
    expect(value(elbowDimensions('6', 'LR90')).bendRadiusMm).toBe(229);
    expect(value(elbowDimensions('6', 'LR45')).bendRadiusMm).toBe(229);
    expect(value(elbowDimensions('6', 'LR180')).bendRadiusMm).toBe(229);
  });
});

describe('elbowDimensions: LR 45° B (ASME B16.9)', () => {
  // Weldolets dimension sheet (metric B16.9), exact; NPS 4 is 64 from memory (sources 63.0 / 63.5 / 64).
  const sheet: Array<[Nps, number]> = [
    ['1', 22],
    ['2', 35],
    ['3', 51],
    ['6', 95],
    ['8', 127],
    ['10', 159],
    ['12', 190],
    ['16', 254],
    ['24', 381],
  ];
  it.each(sheet)('NPS %s equals %i mm', (nps, mm) => {
    expect(value(elbowDimensions(nps, 'LR45')).centreToEndMm).toBe(mm);
  });

  it('NPS 4 is 64 mm and marked from memory', () => {
    expect(value(elbowDimensions('4', 'LR45'))).toMatchObject({ centreToEndMm: 64, status: 'M' });
  });

  // Fitting maker's catalogue (exact inch conversions), ±2 mm.
  const catalogue: Array<[Nps, number]> = [
    ['1/2', 15.7],
    ['1-1/4', 25.4],
    ['1-1/2', 28.4],
    ['2-1/2', 44.4],
    ['5', 79.2],
    ['14', 222.2],
    ['18', 285.8],
    ['20', 317.5],
  ];
  it.each(catalogue)('NPS %s is within ±2 mm of the catalogue %f mm', (nps, mm) => {
    expect(Math.abs(value(elbowDimensions(nps, 'LR45')).centreToEndMm - mm)).toBeLessThanOrEqual(B169_TOL_MM);
  });

  it('is longer than R·tan 22.5° in small sizes, so B is never derived from A', () => {
    // NPS 1: 38 × tan 22.5° = 15.7 mm against 22 mm in the table (computed).
    const e = value(elbowDimensions('1', 'LR45'));
    expect(e.centreToEndMm - e.bendRadiusMm * Math.tan(Math.PI / 8)).toBeGreaterThan(5);
  });
});

describe('elbowDimensions: SR 90° and 180° returns (ASME B16.9)', () => {
  // wermac "Butt Weld Elbows 90°-SR ASME B16.9", exact.
  const sr90: Array<[Nps, number]> = [
    ['1', 25],
    ['1-1/4', 32],
    ['1-1/2', 38],
    ['2', 51],
    ['2-1/2', 64],
    ['3', 76],
    ['4', 102],
    ['5', 127],
    ['6', 152],
    ['8', 203],
    ['10', 254],
    ['12', 305],
    ['14', 356],
    ['16', 406],
    ['18', 457],
    ['20', 508],
    ['24', 610],
  ];
  it.each(sr90)('SR 90° NPS %s equals %i mm', (nps, mm) => {
    const e = value(elbowDimensions(nps, 'SR90'));
    expect(e.centreToEndMm).toBe(mm);
    expect(e.bendRadiusMm).toBe(mm);
  });

  it('has no SR elbow below NPS 1 (B16.9 starts there)', () => {
    expect(elbowDimensions('1/2', 'SR90')).toEqual({
      ok: false,
      missing: 'No ASME B16.9 short-radius 90° elbow data for NPS 1/2',
    });
  });

  // wermac "Butt Weld Elbows 180° LR and SR ASME B16.9": [NPS, LR O, LR K, SR O, SR K].
  const returns: Array<[Nps, number, number, number | null, number | null]> = [
    ['1/2', 76, 48, null, null],
    ['1', 76, 56, 51, 41],
    ['1-1/4', 95, 70, 64, 52],
    ['1-1/2', 114, 83, 76, 62],
    ['2', 152, 106, 102, 81],
    ['2-1/2', 190, 132, 127, 100],
    ['3', 229, 159, 152, 121],
    ['4', 305, 210, 203, 159],
    ['5', 381, 262, 254, 197],
    ['6', 457, 313, 305, 237],
    ['8', 610, 414, 406, 313],
    ['10', 762, 518, 508, 391],
    ['12', 914, 619, 610, 467],
    ['14', 1067, 711, 711, 533],
    ['16', 1219, 813, 813, 610],
    ['18', 1372, 914, 914, 686],
    ['20', 1524, 1016, 1016, 762],
    ['24', 1829, 1219, 1219, 914],
  ];
  it.each(returns)('NPS %s LR 180° O %i K %i, SR 180° O %s K %s', (nps, lo, lk, so, sk) => {
    expect(value(elbowDimensions(nps, 'LR180'))).toMatchObject({ centreToEndMm: lo, backToFaceMm: lk });
    if (so === null) expect(elbowDimensions(nps, 'SR180').ok).toBe(false);
    else expect(value(elbowDimensions(nps, 'SR180'))).toMatchObject({ centreToEndMm: so, backToFaceMm: sk });
  });

  it('LR 180° O is twice the LR 90° A within the ±6/±10 mm return tolerance', () => {
    for (const nps of NPS_VALUES) {
      const r = elbowDimensions(nps, 'LR180');
      const a = elbowDimensions(nps, 'LR90');
      if (!r.ok || !a.ok) continue;
      expect(Math.abs(r.value.centreToEndMm - 2 * a.value.centreToEndMm)).toBeLessThanOrEqual(6);
    }
  });

  it('returns a miss naming the kind and size', () => {
    const kinds: ElbowKind[] = ['LR90', 'SR90', 'LR45', 'LR180', 'SR180'];
    for (const k of kinds) {
      const r = elbowDimensions('3/4', k);
      if (!r.ok) expect(r.missing).toMatch(/^No ASME B16\.9 .+ data for NPS 3\/4$/);
    }
  });
});

describe('teeDimensions (ASME B16.9)', () => {
  // Straight tees C = M: wermac straight-tee table (alloysteelfittings mirror), exact.
  const straight: Array<[Nps, number]> = [
    ['1/2', 25],
    ['3/4', 29],
    ['1', 38],
    ['1-1/4', 48],
    ['1-1/2', 57],
    ['2', 64],
    ['2-1/2', 76],
    ['3', 86],
    ['4', 105],
    ['5', 124],
    ['6', 143],
    ['8', 178],
    ['10', 216],
    ['12', 254],
    ['14', 279],
    ['16', 305],
    ['18', 343],
    ['20', 381],
    ['24', 432],
  ];
  it.each(straight)('straight NPS %s: C = M = %i mm', (nps, mm) => {
    expect(value(teeDimensions(nps, nps))).toMatchObject({
      runCentreToEndMm: mm,
      branchCentreToEndMm: mm,
      status: 'S',
    });
  });

  // Reducing tees: pipingengineer.org "Butt Weld Reducing Tees and Crosses Metric Dimensions as per ASME B16.9".
  const reducing: Array<[Nps, Nps, number, number]> = [
    ['2', '1-1/2', 64, 60],
    ['2', '1', 64, 51],
    ['2', '3/4', 64, 44],
    ['3', '2', 86, 76],
    ['4', '3', 105, 98],
    ['4', '2', 105, 89],
    ['5', '4', 124, 117],
    ['6', '4', 143, 130],
    ['6', '3', 143, 124],
    ['8', '6', 178, 168],
    ['8', '4', 178, 156],
    ['10', '8', 216, 203],
    ['10', '6', 216, 194],
    ['12', '8', 254, 229],
    ['12', '6', 254, 219],
  ];
  it.each(reducing)('reducing %s × %s: C %i, M %i', (run, branch, c, m) => {
    expect(value(teeDimensions(run, branch))).toMatchObject({
      runCentreToEndMm: c,
      branchCentreToEndMm: m,
      status: 'S',
    });
  });

  it('marks reducing tees beyond the sourced range as from memory (14 × 6)', () => {
    expect(value(teeDimensions('14', '6'))).toMatchObject({
      runCentreToEndMm: 279,
      branchCentreToEndMm: 238,
      status: 'M',
    });
  });

  it('has C equal to the straight-tee value of the run, and M ≤ C, for every reducing tee', () => {
    for (const run of NPS_VALUES) {
      const straightTee = value(teeDimensions(run, run));
      for (const branch of NPS_VALUES) {
        const r = teeDimensions(run, branch);
        if (!r.ok) continue;
        expect(r.value.runCentreToEndMm).toBe(straightTee.runCentreToEndMm);
        expect(r.value.branchCentreToEndMm).toBeLessThanOrEqual(r.value.runCentreToEndMm);
      }
    }
  });

  it('carries at least three reducing outlets for every run from NPS 1-1/4 up', () => {
    for (const run of NPS_VALUES.slice(NPS_VALUES.indexOf('1-1/4'))) {
      const count = NPS_VALUES.filter((b) => b !== run && teeDimensions(run, b).ok).length;
      expect(count).toBeGreaterThanOrEqual(3);
    }
  });

  it('refuses an outlet larger than the run and names an unlisted combination', () => {
    expect(teeDimensions('4', '6').ok).toBe(false);
    expect(teeDimensions('24', '2')).toEqual({
      ok: false,
      missing: 'No ASME B16.9 reducing tee data for NPS 24 × 24 × 2',
    });
  });
});

describe('reducerDimensions (ASME B16.9)', () => {
  // enggcyclopedia "Standard reducer dimensions" (B16.9 Table 11, large ends NPS 3/4–10): every
  // listed pair in our size range, with H. NPS 3/8 and 3-1/2 ends are outside Tackline's sizes.
  const enggcyclopedia: Array<[Nps, Nps[], number]> = [
    ['3/4', ['1/2'], 38],
    ['1', ['3/4', '1/2'], 51],
    ['1-1/4', ['1', '3/4', '1/2'], 51],
    ['1-1/2', ['1-1/4', '1', '3/4', '1/2'], 64],
    ['2', ['1-1/2', '1-1/4', '1', '3/4'], 76],
    ['2-1/2', ['2', '1-1/2', '1-1/4', '1'], 89],
    ['3', ['2-1/2', '2', '1-1/2', '1-1/4'], 89],
    ['4', ['3', '2-1/2', '2', '1-1/2'], 102],
    ['5', ['4', '3', '2-1/2', '2'], 127],
    ['6', ['5', '4', '3', '2-1/2'], 140],
    ['8', ['6', '5', '4'], 152],
    ['10', ['8', '6', '5', '4'], 178],
  ];
  it.each(enggcyclopedia)('large end NPS %s makes exactly %j, H = %i mm', (large, smalls, h) => {
    const made = NPS_VALUES.filter((s) => reducerDimensions(large, s).ok);
    expect(made.sort()).toEqual([...smalls].sort());
    for (const s of smalls)
      expect(value(reducerDimensions(large, s))).toMatchObject({ lengthMm: h, status: 'S' });
  });

  it('NPS 6 × 2-1/2 is 140 mm (wermac butt-weld fittings part 4)', () => {
    expect(value(reducerDimensions('6', '2-1/2')).lengthMm).toBe(140);
  });

  it('marks NPS 12, 16 and 24 lengths as from memory', () => {
    expect(value(reducerDimensions('12', '10'))).toMatchObject({ lengthMm: 203, status: 'M' });
    expect(value(reducerDimensions('16', '14'))).toMatchObject({ lengthMm: 356, status: 'M' });
    expect(value(reducerDimensions('24', '20'))).toMatchObject({ lengthMm: 508, status: 'M' });
  });

  it('has every large end reduce at least one and, from NPS 1-1/2 up, three sizes', () => {
    for (const large of NPS_VALUES.slice(1)) {
      const count = NPS_VALUES.filter((s) => reducerDimensions(large, s).ok).length;
      expect(count).toBeGreaterThanOrEqual(NPS_VALUES.indexOf(large) >= NPS_VALUES.indexOf('1-1/2') ? 3 : 1);
    }
  });

  it('refuses a non-reduction and names an unlisted pair', () => {
    expect(reducerDimensions('4', '4').ok).toBe(false);
    expect(reducerDimensions('4', '6').ok).toBe(false);
    expect(reducerDimensions('24', '4')).toEqual({
      ok: false,
      missing: 'No ASME B16.9 reducer data for NPS 24 × 4',
    });
  });
});

describe('capDimensions (ASME B16.9)', () => {
  // wermac caps table (alloysteelfittings mirror, columns H / H1 = B16.9 E / E1), exact.
  const caps: Array<[Nps, number, number]> = [
    ['1/2', 25, 25],
    ['1', 38, 38],
    ['2', 38, 44],
    ['3', 51, 64],
    ['4', 64, 76],
    ['6', 89, 102],
    ['8', 102, 127],
    ['10', 127, 152],
    ['12', 152, 178],
    ['14', 165, 191],
    ['16', 178, 203],
    ['18', 203, 229],
    ['20', 229, 254],
    ['24', 267, 305],
  ];
  it.each(caps)('NPS %s: E %i up to the limiting wall, E1 %i above it', (nps, e, e1) => {
    const thin = value(capDimensions(nps, 2));
    expect(thin.lengthMm).toBe(e);
    expect(value(capDimensions(nps, thin.limitingWallMm + 0.5)).lengthMm).toBe(e1);
  });

  it('uses E at exactly the limiting wall (from memory: 10.92 mm for NPS 6)', () => {
    expect(value(capDimensions('6', 10.92)).lengthMm).toBe(89);
    expect(value(capDimensions('6', 10.97)).lengthMm).toBe(102); // NPS 6 XS wall
  });

  it('rejects a missing or nonsense wall', () => {
    for (const wall of [0, -3, Number.NaN, Number.POSITIVE_INFINITY])
      expect(capDimensions('6', wall).ok).toBe(false);
  });
});
