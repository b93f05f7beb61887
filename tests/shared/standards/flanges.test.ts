import { describe, expect, it } from 'vitest';
import {
  flangeDimensions,
  inchFractionToNumber,
  RAISED_FACE_CONVENTION,
  RAISED_FACE_MM,
  slipOnSetbackMm,
  type FlangeClass,
} from '../../../shared/standards/flanges';
import { NPS_VALUES, type Nps } from '../../../shared/standards/nps';

function value<T>(r: { ok: true; value: T } | { ok: false; missing: string }): T {
  if (!r.ok) throw new Error(r.missing);
  return r.value;
}

describe('flangeDimensions Class 150 (ASME B16.5)', () => {
  // ASME B16.5-2009 Table 7, drilling templates for Class 150 (a reproduction of the table): exact.
  // [NPS, OD mm, bolt circle mm, bolts, hole in, bolt in]
  const table7: Array<[Nps, number, number, number, string, string]> = [
    ['1', 110, 79.4, 4, '5/8', '1/2'],
    ['1-1/4', 115, 88.9, 4, '5/8', '1/2'],
    ['1-1/2', 125, 98.4, 4, '5/8', '1/2'],
    ['2', 150, 120.7, 4, '3/4', '5/8'],
    ['2-1/2', 180, 139.7, 4, '3/4', '5/8'],
    ['3', 190, 152.4, 4, '3/4', '5/8'],
    ['4', 230, 190.5, 8, '3/4', '5/8'],
    ['5', 255, 215.9, 8, '7/8', '3/4'],
    ['6', 280, 241.3, 8, '7/8', '3/4'],
    ['8', 345, 298.5, 8, '7/8', '3/4'],
    ['10', 405, 362.0, 12, '1', '7/8'],
    ['12', 485, 431.8, 12, '1', '7/8'],
    ['14', 535, 476.3, 12, '1-1/8', '1'],
    ['16', 595, 539.8, 16, '1-1/8', '1'],
    ['18', 635, 577.9, 16, '1-1/4', '1-1/8'],
    ['20', 700, 635.0, 20, '1-1/4', '1-1/8'],
    ['24', 815, 749.3, 20, '1-3/8', '1-1/4'],
  ];
  it.each(table7)('NPS %s: OD %i, BC %f, %i × %s in holes, %s in bolts', (nps, od, bc, n, hole, bolt) => {
    const f = value(flangeDimensions(nps, 150, 'weld-neck'));
    expect(f).toMatchObject({
      odMm: od,
      boltCircleMm: bc,
      boltCount: n,
      boltHoleDiaIn: hole,
      boltSizeIn: bolt,
    });
    // Hole diameters are B16.5's inch values converted and rounded to 0.1 mm.
    expect(Math.abs(f.boltHoleDiaMm - inchFractionToNumber(hole) * 25.4)).toBeLessThanOrEqual(0.05 + 1e-9);
  });

  // Weld-neck length through hub in the pre-2003 tables, which include the 1.6 mm raised face
  // (a pre-2003 Class 150 forged-flange table, mm). Ours excludes it: Y + 1.6 should match within 0.6 mm.
  const pre2003Y: Array<[Nps, number]> = [
    ['1', 55.6],
    ['1-1/4', 57.2],
    ['1-1/2', 62.0],
    ['2', 63.5],
    ['2-1/2', 69.9],
    ['3', 69.9],
    ['4', 76.2],
    ['5', 88.9],
    ['6', 88.9],
    ['8', 101.6],
    ['10', 101.6],
    ['12', 114.3],
    ['14', 127.0],
    ['16', 127.0],
    ['18', 139.7],
    ['20', 144.5],
    ['24', 152.4],
  ];
  it.each(pre2003Y)('NPS %s weld-neck Y excludes the face: Y + 1.6 ≈ %f mm (pre-2003 value)', (nps, y) => {
    const f = value(flangeDimensions(nps, 150, 'weld-neck'));
    expect(Math.abs(f.hubLengthMm + 1.6 - y)).toBeLessThanOrEqual(0.6);
  });

  // Flange thickness in the same pre-2003 table (incl. 1.6 mm face): ours + 1.6 within 0.3 mm.
  const pre2003T: Array<[Nps, number]> = [
    ['1/2', 11.2],
    ['3/4', 12.7],
    ['1', 14.2],
    ['1-1/4', 15.7],
    ['1-1/2', 17.5],
    ['2', 19.1],
    ['2-1/2', 22.4],
    ['3', 23.9],
    ['4', 23.9],
    ['5', 23.9],
    ['6', 25.4],
    ['8', 28.4],
    ['10', 30.2],
    ['12', 31.8],
    ['14', 35.1],
    ['16', 36.6],
    ['18', 39.6],
    ['20', 42.9],
    ['24', 47.8],
  ];
  it.each(pre2003T)('NPS %s thickness excludes the face: tf + 1.6 ≈ %f mm', (nps, t) => {
    const f = value(flangeDimensions(nps, 150, 'blind'));
    expect(Math.abs(f.thicknessMm + 1.6 - t)).toBeLessThanOrEqual(0.3);
    expect(f.hubLengthMm).toBe(f.thicknessMm);
    expect(f.hubDiaAtBaseMm).toBeUndefined();
  });
});

describe('flangeDimensions Class 300 (ASME B16.5)', () => {
  // zaffertec "ANSI B16.5 Forged Flanges Class 300" (mm, converted inches, thickness and Y exclude the face).
  // [NPS, OD, BC, bolts, hole mm, WN Y, thickness]
  const zaffertec: Array<[Nps, number, number, number, number, number, number]> = [
    ['1/2', 95, 66.5, 4, 15.7, 50.8, 12.6],
    ['3/4', 117, 82.6, 4, 19.1, 55.6, 14.1],
    ['1', 124, 88.9, 4, 19.1, 60.4, 15.9],
    ['1-1/4', 133, 98.6, 4, 19.1, 63.5, 17.5],
    ['1-1/2', 155, 114.3, 4, 22.4, 66.7, 19.0],
    ['2', 165, 127.0, 8, 19.1, 68.3, 20.8],
    ['2-1/2', 191, 149.4, 8, 22.4, 74.6, 23.8],
    ['3', 210, 168.1, 8, 22.4, 77.6, 26.8],
  ];
  it.each(zaffertec)('NPS %s matches within conversion rounding', (nps, od, bc, n, hole, y, t) => {
    const f = value(flangeDimensions(nps, 300, 'weld-neck'));
    expect(Math.abs(f.odMm - od)).toBeLessThanOrEqual(2.5); // B16.5 metric OD vs converted inch (conflict noted)
    expect(Math.abs(f.boltCircleMm - bc)).toBeLessThanOrEqual(0.25);
    expect(f.boltCount).toBe(n);
    expect(Math.abs(f.boltHoleDiaMm - hole)).toBeLessThanOrEqual(0.6);
    expect(Math.abs(f.hubLengthMm - y)).toBeLessThanOrEqual(0.6);
    expect(Math.abs(f.thicknessMm - t)).toBeLessThanOrEqual(0.3);
  });

  // Bolt circle and count shared with the B16.36 Class 400 orifice drilling (zaffertec orifice table).
  const orifice: Array<[Nps, number, number]> = [
    ['4', 200.2, 8],
    ['5', 235.0, 8],
    ['6', 269.7, 12],
    ['8', 330.2, 12],
  ];
  it.each(orifice)('NPS %s bolt circle ≈ %f mm with %i bolts', (nps, bc, n) => {
    const f = value(flangeDimensions(nps, 300, 'weld-neck'));
    expect(Math.abs(f.boltCircleMm - bc)).toBeLessThanOrEqual(0.25);
    expect(f.boltCount).toBe(n);
  });

  it('marks NPS 10–24 Class 300 as from memory', () => {
    for (const nps of ['10', '12', '14', '16', '18', '20', '24'] as const) {
      expect(value(flangeDimensions(nps, 300, 'weld-neck')).status).toBe('M');
    }
  });

  it('has the correct NPS 2 drilling a vendor page gets wrong (127.0 mm, 8 holes, not 4)', () => {
    expect(value(flangeDimensions('2', 300, 'weld-neck'))).toMatchObject({
      boltCircleMm: 127.0,
      boltCount: 8,
    });
  });
});

describe('flange conventions', () => {
  const classes: FlangeClass[] = [150, 300];

  it('bolt counts are multiples of 4 for every size and class (straddle rule)', () => {
    for (const c of classes)
      for (const nps of NPS_VALUES)
        expect(value(flangeDimensions(nps, c, 'weld-neck')).boltCount % 4).toBe(0);
  });

  it('bolt circle sits between the raised face and the flange OD, holes clear of both', () => {
    for (const c of classes) {
      for (const nps of NPS_VALUES) {
        const f = value(flangeDimensions(nps, c, 'weld-neck'));
        expect(f.boltCircleMm - f.boltHoleDiaMm).toBeGreaterThan(f.raisedFaceDiaMm);
        expect(f.boltCircleMm + f.boltHoleDiaMm).toBeLessThan(f.odMm);
        expect(f.hubLengthMm).toBeGreaterThan(f.thicknessMm);
      }
    }
  });

  it('first-hole check coordinates for two-holing, from the bolt circle (computed): NPS 6 Cl 150 → (46.17, 111.47)', () => {
    const f = value(flangeDimensions('6', 150, 'weld-neck'));
    const half = Math.PI / f.boltCount;
    expect((f.boltCircleMm / 2) * Math.sin(half)).toBeCloseTo(46.17, 2);
    expect((f.boltCircleMm / 2) * Math.cos(half)).toBeCloseTo(111.47, 2);
  });

  it('reports the 2 mm raised face separately and states the convention', () => {
    const f = value(flangeDimensions('4', 150, 'weld-neck'));
    expect(f.raisedFaceMm).toBe(RAISED_FACE_MM);
    expect(RAISED_FACE_MM).toBe(2);
    expect(RAISED_FACE_CONVENTION).toMatch(/2003/);
  });

  it('slip-on setback is wall + 3 mm (common practice, no source), STD wall when none is given', () => {
    expect(value(flangeDimensions('6', 150, 'slip-on')).slipOnSetbackMm).toBeCloseTo(7.11 + 3, 6);
    expect(value(flangeDimensions('6', 150, 'slip-on', { pipeWallMm: 10.97 })).slipOnSetbackMm).toBeCloseTo(
      13.97,
      6,
    );
    expect(slipOnSetbackMm(5)).toBe(8);
    expect(flangeDimensions('6', 150, 'slip-on', { pipeWallMm: -1 }).ok).toBe(false);
    expect(value(flangeDimensions('6', 150, 'weld-neck')).slipOnSetbackMm).toBeUndefined();
  });

  it('refuses a class without a table, naming the supported ones, never another class', () => {
    const r = flangeDimensions('6', 900 as FlangeClass, 'weld-neck');
    expect(r).toEqual({
      ok: false,
      missing:
        'ASME B16.5 Class 900 is not supported: Tackline has flange tables for Classes 150, 300 and 600 only',
    });
  });

  it('reads inch fractions', () => {
    expect(inchFractionToNumber('1-3/8')).toBe(1.375);
    expect(inchFractionToNumber('7/8')).toBe(0.875);
    expect(inchFractionToNumber('1')).toBe(1);
    expect(inchFractionToNumber('x')).toBeNaN();
  });
});
