import { describe, expect, it } from 'vitest';
import type { Nps } from '../../../shared/standards/nps';
import {
  SOCKET_EXPANSION_GAP_MM,
  socketInsertionMm,
  socketWeldDimensions,
} from '../../../shared/standards/socket-weld-fittings';

function value<T>(r: { ok: true; value: T } | { ok: false; missing: string }): T {
  if (!r.ok) throw new Error(r.missing);
  return r.value;
}

describe('socketWeldDimensions (ASME B16.11 Class 3000)', () => {
  // ASME B16.11-2016 metric table via vaibhavfitting.com: [NPS, bore B min, depth J min, A (90° elbow / tee)], exact.
  const b1611: Array<[Nps, number, number, number]> = [
    ['1/2', 21.8, 9.5, 15.5],
    ['3/4', 27.2, 12.5, 19.0],
    ['1', 33.9, 12.5, 22.5],
    ['1-1/4', 42.7, 12.5, 27.0],
    ['1-1/2', 48.8, 12.5, 32.0],
    ['2', 61.2, 16.0, 38.0],
    // vaibhavfitting "90D ELBOW" B16.11-2016 page, NPS 2-1/2 to 4.
    ['2-1/2', 73.9, 16.0, 41.0],
    ['3', 89.8, 16.0, 57.0],
    ['4', 115.2, 19.0, 66.5],
  ];
  it.each(b1611)('NPS %s: bore %f, depth %f, centre to socket bottom %f mm', (nps, bore, depth, a) => {
    for (const kind of ['elbow90', 'tee'] as const) {
      expect(value(socketWeldDimensions(nps, kind))).toMatchObject({
        socketBoreMm: bore,
        socketDepthMm: depth,
        centreToBottomMm: a,
        status: 'S',
      });
    }
  });

  it('socket bore is larger than the pipe OD it receives (B36.10M OD) by under 1 mm', () => {
    const ods: Array<[Nps, number]> = [
      ['1/2', 21.3],
      ['3/4', 26.7],
      ['1', 33.4],
      ['1-1/2', 48.3],
      ['2', 60.3],
    ];
    for (const [nps, od] of ods) {
      const clearance = value(socketWeldDimensions(nps, 'elbow90')).socketBoreMm - od;
      expect(clearance).toBeGreaterThan(0);
      expect(clearance).toBeLessThan(1);
    }
  });

  // vaibhavfitting "45 DEGREE ELBOW" B16.11-2016 page and creativepiping (same table): A, exact.
  const elbow45: Array<[Nps, number]> = [
    ['1/2', 11.0],
    ['3/4', 13.0],
    ['1', 14.0],
    ['1-1/4', 17.5],
    ['1-1/2', 20.5],
    ['2', 25.5],
    ['2-1/2', 28.5],
    ['3', 32.0],
    ['4', 41.0],
  ];
  it.each(elbow45)('45° elbow NPS %s: A = %f mm', (nps, a) => {
    expect(value(socketWeldDimensions(nps, 'elbow45'))).toMatchObject({ centreToBottomMm: a, status: 'S' });
  });

  // vaibhavfitting "FULL COUPLING" B16.11-2016 page: laying length E (socket bottom to socket bottom), exact.
  const couplingE: Array<[Nps, number]> = [
    ['1/2', 9.5],
    ['3/4', 9.5],
    ['1', 12.5],
    ['1-1/4', 12.5],
    ['1-1/2', 12.5],
    ['2', 19.0],
  ];
  it.each(couplingE)(
    'coupling NPS %s: laying length %f mm, centre to each socket bottom half of it',
    (nps, e) => {
      const c = value(socketWeldDimensions(nps, 'coupling'));
      expect(c.lengthMm).toBe(e);
      expect(c.centreToBottomMm).toBe(e / 2);
    },
  );

  // mumbadevisteel coupling table, half coupling: F, bottom of socket to opposite face (the
  // ASME B16.11 definition of the half-coupling dimension); marked M until checked.
  const half: Array<[Nps, number]> = [
    ['1/2', 22.5],
    ['3/4', 24.0],
    ['1', 28.5],
    ['1-1/4', 30.0],
    ['1-1/2', 32.0],
    ['2', 41.0],
  ];
  it.each(half)(
    'half coupling NPS %s: F = %f mm from socket bottom to the opposite face, overall F + J, unconfirmed',
    (nps, f) => {
      const h = value(socketWeldDimensions(nps, 'half-coupling'));
      expect(h.socketBottomToFaceMm).toBe(f);
      expect(h.lengthMm).toBe(f + h.socketDepthMm);
      expect(h.status).toBe('M');
      expect(h.centreToBottomMm).toBe(h.socketDepthMm);
    },
  );

  it('misses sizes above NPS 4 and caps, naming them', () => {
    expect(socketWeldDimensions('6', 'elbow90')).toEqual({
      ok: false,
      missing: 'No ASME B16.11 Class 3000 socket-weld elbow90 data for NPS 6',
    });
    expect(socketWeldDimensions('1', 'cap').ok).toBe(false);
  });

  it('expansion gap is 1.6 mm (B31.3: about 1/16 in, "approximately 1.5 mm" metric)', () => {
    expect(SOCKET_EXPANSION_GAP_MM).toBe(1.6);
    expect(Math.abs(SOCKET_EXPANSION_GAP_MM - 25.4 / 16)).toBeLessThan(0.05);
  });

  it('pipe goes into the socket its depth less the gap; cut length between two 1" elbows (computed)', () => {
    const e = value(socketWeldDimensions('1', 'elbow90'));
    expect(socketInsertionMm(e.socketDepthMm)).toBeCloseTo(10.9, 6);
    // C–C 500 mm between two 1" Class 3000 elbows: 500 − (22.5 + 1.6) × 2 = 451.8 mm.
    expect(500 - 2 * (e.centreToBottomMm + SOCKET_EXPANSION_GAP_MM)).toBeCloseTo(451.8, 6);
  });

  // vaibhavfitting B16.11-2016 Class 3000 cross table: socket wall C (average) and bore D.
  const walls: Array<[Nps, number, number]> = [
    ['1/2', 4.67, 15.8],
    ['1', 5.69, 26.7],
    ['2', 6.93, 52.5],
    ['4', 10.69, 102.3],
  ];
  it.each(walls)('NPS %s: socket wall C %f mm, fitting bore D %f mm (for weight estimates)', (nps, c, d) => {
    const v = value(socketWeldDimensions(nps, 'tee'));
    expect(v.socketWallMm).toBe(c);
    expect(v.fittingBoreMm).toBe(d);
    expect(v.fittingBoreMm).toBeLessThan(v.socketBoreMm);
  });
});
