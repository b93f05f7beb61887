import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFtIn, formatLength, formatMm, MM_PER_INCH } from '../../../shared/units/length-format';
import { parseLength } from '../../../shared/units/length-parse';

const inch = (n: number) => n * MM_PER_INCH;

describe('formatMm', () => {
  it('prints one decimal and the unit by default', () => {
    expect(formatMm(394.5)).toBe('394.5 mm');
    expect(formatMm(394.46)).toBe('394.5 mm');
    expect(formatMm(1000, 0)).toBe('1000 mm');
    expect(formatMm(2.25, 2)).toBe('2.25 mm');
  });

  it('prints no minus sign for a value that rounds to zero, and a dash for non-numbers', () => {
    expect(formatMm(-0.01)).toBe('0.0 mm');
    expect(formatMm(-12.3)).toBe('-12.3 mm');
    expect(formatMm(Number.NaN)).toBe('—');
    expect(formatMm(Number.POSITIVE_INFINITY)).toBe('—');
  });
});

describe('formatFtIn', () => {
  it.each([
    [inch(15.5), `1'-3 1/2"`],
    [inch(12), `1'-0"`],
    [inch(11 + 15 / 16), `11 15/16"`],
    [inch(12 + 1 / 16), `1'-0 1/16"`],
    [inch(0.5), `1/2"`],
    [inch(3 * 12), `3'-0"`],
    [inch(100 * 12 + 7.25), `100'-7 1/4"`],
    [0, `0"`],
  ])('%f mm → %s', (mm, text) => {
    expect(formatFtIn(mm)).toBe(text);
  });

  it('reduces fractions (8/16 → 1/2, 12/16 → 3/4, 2/16 → 1/8)', () => {
    expect(formatFtIn(inch(2 + 8 / 16))).toBe(`2 1/2"`);
    expect(formatFtIn(inch(2 + 12 / 16))).toBe(`2 3/4"`);
    expect(formatFtIn(inch(2 + 2 / 16))).toBe(`2 1/8"`);
  });

  it('rounds to the nearest 1/16 and carries into the next foot (11 31/32" → 1\'-0")', () => {
    expect(formatFtIn(inch(11 + 31.5 / 32))).toBe(`1'-0"`);
    expect(formatFtIn(inch(1 / 40))).toBe(`0"`);
  });

  it('rounds exact halves of a sixteenth up (3/32" → 1/8")', () => {
    // 3/32 in converted to mm (2.3812499999999996 in floating point) divides back to a hair
    // under 1.5 sixteenths, which used to round down to 1/16".
    expect(formatFtIn(inch(3 / 32))).toBe(`1/8"`);
    expect(formatFtIn(2.38125)).toBe(`1/8"`);
  });

  it('puts a minus in front of negative lengths', () => {
    expect(formatFtIn(-inch(15.5))).toBe(`-1'-3 1/2"`);
    expect(formatFtIn(-inch(0.001))).toBe(`0"`);
  });

  it('never prints 12 inches or an unreduced fraction (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (mm) => {
        const text = formatFtIn(mm);
        expect(text).not.toMatch(/(^|-)12(\s|")/);
        const frac = /(\d+)\/(\d+)"/.exec(text);
        if (frac) {
          expect(Number(frac[1]) % 2 === 1).toBe(true);
          expect([2, 4, 8, 16]).toContain(Number(frac[2]));
        }
      }),
    );
  });

  it('round-trips through parseLength within 1/32 in (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -50_000, max: 50_000, noNaN: true }), (mm) => {
        const back = parseLength(formatFtIn(mm), 'ft-in');
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.mm - mm)).toBeLessThanOrEqual(MM_PER_INCH / 32 + 1e-9);
      }),
    );
  });

  it('mm format round-trips through parseLength within 0.05 mm (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (mm) => {
        const back = parseLength(formatMm(mm), 'mm');
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.mm - mm)).toBeLessThanOrEqual(0.05 + 1e-6);
      }),
    );
  });
});

describe('formatLength', () => {
  it('chooses the formatter by units', () => {
    expect(formatLength(393.7, 'mm')).toBe('393.7 mm');
    expect(formatLength(393.7, 'ft-in')).toBe(`1'-3 1/2"`);
  });
});
