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
    ['1/2', 21.8, 9.5, 15.5], ['3/4', 27.2, 12.5, 19.0], ['1', 33.9, 12.5, 22.5],
    ['1-1/4', 42.7, 12.5, 27.0], ['1-1/2', 48.8, 12.5, 32.0], ['2', 61.2, 16.0, 38.0],
  ];
  it.each(b1611)('NPS %s: bore %f, depth %f, centre to socket bottom %f mm', (nps, bore, depth, a) => {
    for (const kind of ['elbow90', 'tee'] as const) {
      expect(value(socketWeldDimensions(nps, kind))).toMatchObject({ socketBoreMm: bore, socketDepthMm: depth, centreToBottomMm: a, status: 'S' });
    }
  });

  it('socket bore is larger than the pipe OD it receives (B36.10M OD) by under 1 mm', () => {
    const ods: Array<[Nps, number]> = [['1/2', 21.3], ['3/4', 26.7], ['1', 33.4], ['1-1/2', 48.3], ['2', 60.3]];
    for (const [nps, od] of ods) {
      const clearance = value(socketWeldDimensions(nps, 'elbow90')).socketBoreMm - od;
      expect(clearance).toBeGreaterThan(0);
      expect(clearance).toBeLessThan(1);
    }
  });

  it('marks the 45° elbow and coupling lengths as from memory', () => {
    expect(value(socketWeldDimensions('1', 'elbow45')).status).toBe('M');
    const c = value(socketWeldDimensions('1', 'coupling'));
    expect(c.status).toBe('M');
    expect(c.centreToBottomMm * 2).toBe(c.lengthMm);
  });

  it('misses sizes above NPS 2 and kinds not carried, naming them', () => {
    expect(socketWeldDimensions('3', 'elbow90')).toEqual({ ok: false, missing: 'No ASME B16.11 Class 3000 socket-weld elbow90 data for NPS 3' });
    expect(socketWeldDimensions('1', 'half-coupling').ok).toBe(false);
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
});
