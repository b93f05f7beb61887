import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mitreTemplate, type MitreInput } from '../../../shared/templates/mitre-template';

function template(input: MitreInput) {
  const r = mitreTemplate(input);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

describe('mitreTemplate', () => {
  // machinecalcs "Pipe miter cut calculator": cut angle = (bend / welds) / 2.
  it.each([
    [3, 22.5],
    [4, 15],
    [5, 11.25],
  ])('a 90° bend in %i pieces has %f° cuts', (pieces, cut) => {
    const t = template({ odMm: 168.3, bendAngleDeg: 90, pieces, stations: 16 });
    expect(t.cutAngleDeg).toBeCloseTo(cut, 12);
    expect(t.welds).toBe(pieces - 1);
  });

  it('long-to-short difference is OD × tan(cut): NPS 12 (323.8 mm) at 22.5° → 134.1 mm (machinecalcs formula, computed)', () => {
    const t = template({ odMm: 323.8, bendAngleDeg: 90, pieces: 3, stations: 16 });
    expect(t.longShortDifferenceMm).toBeCloseTo(134.1, 1);
    expect(t.stations[8]!.ordinateMm).toBeCloseTo(t.longShortDifferenceMm, 9);
    expect(t.stations[0]!.ordinateMm).toBe(0);
    expect(t.stations[4]!.ordinateMm).toBeCloseTo(t.longShortDifferenceMm / 2, 9);
  });

  it('with a radius, the pieces add up to the bend: tangent points R·tan(bend/2) from the intersection', () => {
    const R = 457;
    const t = template({ odMm: 323.8, bendAngleDeg: 90, pieces: 3, stations: 8, radiusMm: R });
    expect(t.pieces).toHaveLength(3);
    expect(t.pieces!.map((p) => p.kind)).toEqual(['end', 'middle', 'end']);
    // Walk the centreline polyline from one tangent point and check it lands on the other.
    let x = 0,
      y = 0,
      heading = 0;
    t.pieces!.forEach((p, i) => {
      x += p.centrelineMm * Math.cos(heading);
      y += p.centrelineMm * Math.sin(heading);
      if (i < t.pieces!.length - 1) heading += (t.deflectionPerWeldDeg * Math.PI) / 180;
    });
    expect(x).toBeCloseTo(R, 6);
    expect(y).toBeCloseTo(R, 6);
    expect(t.centreToEndMm).toBeCloseTo(R, 9);
    const middle = t.pieces![1]!;
    expect(middle.backMm - middle.throatMm).toBeCloseTo(2 * t.longShortDifferenceMm, 9);
  });

  it('piece lengths are positive and the throat shorter than the back (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 1500, noNaN: true }),
        fc.double({ min: 1, max: 179, noNaN: true }),
        fc.integer({ min: 2, max: 12 }),
        fc.double({ min: 0.51, max: 5, noNaN: true }),
        (od, bend, pieces, radiusInOds) => {
          const r = mitreTemplate({
            odMm: od,
            bendAngleDeg: bend,
            pieces,
            stations: 16,
            radiusMm: od * radiusInOds,
          });
          if (!r.ok) {
            expect(r.message).toMatch(/more pieces/);
            return;
          }
          for (const p of r.value.pieces!) {
            expect(p.throatMm).toBeGreaterThan(0);
            expect(p.backMm).toBeGreaterThan(p.throatMm);
          }
          for (const s of r.value.stations) expect(s.ordinateMm).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it.each([
    [{ odMm: 0, bendAngleDeg: 90, pieces: 3, stations: 16 }, 'OD'],
    [{ odMm: 168.3, bendAngleDeg: 0, pieces: 3, stations: 16 }, 'Bend angle'],
    [{ odMm: 168.3, bendAngleDeg: 180, pieces: 3, stations: 16 }, 'Bend angle'],
    [{ odMm: 168.3, bendAngleDeg: Number.NaN, pieces: 3, stations: 16 }, 'Bend angle'],
    [{ odMm: 168.3, bendAngleDeg: 90, pieces: 1, stations: 16 }, 'pieces'],
    [{ odMm: 168.3, bendAngleDeg: 90, pieces: 3.5, stations: 16 }, 'pieces'],
    [{ odMm: 168.3, bendAngleDeg: 90, pieces: 3, stations: 2 }, 'Stations'],
    [{ odMm: 168.3, bendAngleDeg: 120, pieces: 2, stations: 16 }, 'more pieces'],
    [{ odMm: 168.3, bendAngleDeg: 90, pieces: 3, stations: 16, radiusMm: 80 }, 'half the OD'],
  ])('%j → error containing %j', (input, fragment) => {
    const r = mitreTemplate(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});
