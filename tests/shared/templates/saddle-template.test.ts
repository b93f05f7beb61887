import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { setOnBranchTemplate, type SetOnBranchInput } from '../../../shared/templates/saddle-template';

function template(input: SetOnBranchInput) {
  const r = setOnBranchTemplate(input);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

/** Published ordinates are rounded to 0.01 mm; allow the rounding plus float dust. */
const closeTo2dp = (a: number | undefined, b: number) =>
  expect(Math.abs((a ?? Number.NaN) - b)).toBeLessThanOrEqual(0.0051);

/** Cut-backs at θ = 0, 22.5, 45, 67.5, 90° from a 16-station template. */
function quarter(input: Omit<SetOnBranchInput, 'stations'>) {
  return template({ ...input, stations: 16 })
    .stations.slice(0, 5)
    .map((s) => s.branchCutBackMm);
}

describe('setOnBranchTemplate, square branch', () => {
  // Formula y(θ) = R − √(R² − r² sin²θ): tools.gera.services "Pipe bevel & saddle layout" and machinecalcs
  // "Pipe saddle cut calculator"; numbers computed and cross-checked.
  it('NPS 4 on NPS 6 (114.3 on 168.3 mm): 0 / 2.89 / 10.34 / 18.63 / 22.38 mm', () => {
    const y = quarter({ headerOdMm: 168.3, branchOdMm: 114.3 });
    [0, 2.89, 10.34, 18.63, 22.38].forEach((v, i) => closeTo2dp(y[i], v));
  });

  it('4 on 6 depth 22.4 mm matches calcady "Pipe saddle coping" worked example (0.882 in)', () => {
    const t = template({ headerOdMm: 168.3, branchOdMm: 114.3, stations: 32 });
    expect(t.maxCutBackMm).toBeCloseTo(0.882 * 25.4, 1);
  });

  it('NPS 2 on NPS 6 in inches (2.375 on 6.625): 0.108 at the 1/8 mark and 0.220 at the 1/4 mark (machinecalcs default example)', () => {
    const y = quarter({ headerOdMm: 6.625, branchOdMm: 2.375 });
    expect(y[1]).toBeCloseTo(0.031, 3);
    expect(y[2]).toBeCloseTo(0.108, 3);
    expect(y[3]).toBeCloseTo(0.187, 3);
    expect(y[4]).toBeCloseTo(0.22, 3);
  });

  it('NPS 6 on NPS 12 (168.3 on 323.8 mm): 0 / 3.24 / 11.33 / 19.89 / 23.59 mm', () => {
    const y = quarter({ headerOdMm: 323.8, branchOdMm: 168.3 });
    [0, 3.24, 11.33, 19.89, 23.59].forEach((v, i) => closeTo2dp(y[i], v));
  });

  it('equal size NPS 6 on 6: the deepest cut-back is the header radius, 84.15 mm (calcady)', () => {
    const t = template({ headerOdMm: 168.3, branchOdMm: 168.3, stations: 16 });
    expect(t.maxCutBackMm).toBeCloseTo(84.15, 6);
    expect(t.stations[4]!.branchCutBackMm).toBeCloseTo(84.15, 6);
  });

  it('states the origin and is symmetric about both planes', () => {
    const t = template({ headerOdMm: 168.3, branchOdMm: 114.3, stations: 16 });
    expect(t.angleOrigin).toMatch(/Station 0/);
    expect(t.angleOrigin).toMatch(/clockwise/);
    const y = t.stations.map((s) => s.branchCutBackMm);
    for (let i = 1; i < 16; i++) expect(y[i]).toBeCloseTo(y[16 - i]!, 9);
    for (let i = 0; i < 8; i++) expect(y[i]).toBeCloseTo(y[i + 8]!, 9);
  });

  it('gives wrap lengths as circumferences and stations spaced evenly round the branch', () => {
    const t = template({ headerOdMm: 168.3, branchOdMm: 114.3, stations: 8 });
    expect(t.branchCircumferenceMm).toBeCloseTo(Math.PI * 114.3, 9);
    expect(t.headerCircumferenceMm).toBeCloseTo(Math.PI * 168.3, 9);
    expect(t.stations[1]!.branchWrapMm).toBeCloseTo((Math.PI * 114.3) / 8, 9);
    expect(t.datumFromHeaderAxisMm).toBeCloseTo(84.15, 9);
  });

  it('lays the header hole out to the branch bore when the wall is given', () => {
    const t = template({ headerOdMm: 168.3, branchOdMm: 114.3, stations: 4, wallMm: 6.02 });
    const bore = 114.3 - 2 * 6.02;
    expect(t.holeDiameterMm).toBeCloseTo(bore, 9);
    // Along the header at stations 0 and 180°: ∓ bore/2. Round the header at the flank: R·asin(r/R).
    expect(t.stations[0]!.headerHoleAlongMm).toBeCloseTo(-bore / 2, 9);
    expect(t.stations[2]!.headerHoleAlongMm).toBeCloseTo(bore / 2, 9);
    expect(t.stations[1]!.headerHoleArcMm).toBeCloseTo(84.15 * Math.asin(bore / 2 / 84.15), 9);
    expect(t.stations[1]!.headerHoleAlongMm).toBeCloseTo(0, 9);
  });
});

describe('setOnBranchTemplate, angled branch', () => {
  it('at 90° equals the square formula', () => {
    const a = template({ headerOdMm: 273, branchOdMm: 114.3, stations: 16, branchAngleDeg: 90 });
    const b = template({ headerOdMm: 273, branchOdMm: 114.3, stations: 16 });
    a.stations.forEach((s, i) => expect(s.branchCutBackMm).toBeCloseTo(b.stations[i]!.branchCutBackMm, 9));
  });

  it('follows w(θ) = (−r cos θ cos β + √(R² − r² sin²θ)) / sin β, drop = max(w) − w (machinecalcs)', () => {
    const R = 168.3 / 2;
    const r = 114.3 / 2;
    const beta = (45 * Math.PI) / 180;
    const w = (t: number) =>
      (-r * Math.cos(t) * Math.cos(beta) + Math.sqrt(R * R - r * r * Math.sin(t) ** 2)) / Math.sin(beta);
    const maxW = (R + r * Math.cos(beta)) / Math.sin(beta);
    const t = template({ headerOdMm: 168.3, branchOdMm: 114.3, stations: 8, branchAngleDeg: 45 });
    t.stations.forEach((s) =>
      expect(s.branchCutBackMm).toBeCloseTo(maxW - w((s.angleDeg * Math.PI) / 180), 9),
    );
    // Long point (heel) at station 0: 2 r cos β / sin β = 114.3 mm at 45°; shortest point (toe) at 180°.
    expect(t.stations[0]!.branchCutBackMm).toBeCloseTo(114.3, 9);
    expect(t.stations[4]!.branchCutBackMm).toBe(0);
    expect(t.angleOrigin).toMatch(/heel/);
  });

  it('never gives a negative or NaN ordinate (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.integer({ min: 4, max: 128 }),
        fc.double({ min: 5, max: 90, noNaN: true }),
        (headerOd, ratio, stations, angle) => {
          const r = setOnBranchTemplate({
            headerOdMm: headerOd,
            branchOdMm: headerOd * ratio,
            stations,
            branchAngleDeg: angle,
          });
          expect(r.ok).toBe(true);
          if (!r.ok) return;
          for (const s of r.value.stations) {
            for (const v of [s.branchCutBackMm, s.headerHoleAlongMm, s.headerHoleArcMm])
              expect(Number.isFinite(v)).toBe(true);
            expect(s.branchCutBackMm).toBeGreaterThanOrEqual(0);
            expect(s.branchCutBackMm).toBeLessThanOrEqual(r.value.maxCutBackMm + 1e-9);
          }
        },
      ),
    );
  });
});

describe('setOnBranchTemplate, bad input', () => {
  it.each([
    [{ headerOdMm: 114.3, branchOdMm: 168.3, stations: 16 }, 'cannot be larger'],
    [{ headerOdMm: 0, branchOdMm: 60.3, stations: 16 }, 'Header OD'],
    [{ headerOdMm: Number.NaN, branchOdMm: 60.3, stations: 16 }, 'Header OD'],
    [{ headerOdMm: 168.3, branchOdMm: -1, stations: 16 }, 'Branch OD'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 3 }, 'Stations'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 16.5 }, 'Stations'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 16, branchAngleDeg: 0 }, 'Branch angle'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 16, branchAngleDeg: 120 }, 'Branch angle'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 16, wallMm: 40 }, 'no bore'],
    [{ headerOdMm: 168.3, branchOdMm: 60.3, stations: 16, wallMm: 0 }, 'Branch wall'],
  ])('%j → error containing %j', (input, fragment) => {
    const r = setOnBranchTemplate(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});
