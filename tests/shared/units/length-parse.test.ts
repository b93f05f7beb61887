import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../../../shared/units/length-format';
import { parseLength } from '../../../shared/units/length-parse';

const inch = (n: number) => n * MM_PER_INCH;

function mm(text: string, units: 'mm' | 'ft-in' = 'ft-in'): number {
  const r = parseLength(text, units);
  if (!r.ok) throw new Error(r.message);
  return r.mm;
}

describe('parseLength: feet and inches', () => {
  it.each([
    [`1' 3-1/2"`, 15.5],
    [`1'-3 1/2"`, 15.5],
    [`1'3.5"`, 15.5],
    [`1’-3½"`.replace('½', ' 1/2'), 15.5],
    [`15.5"`, 15.5],
    [`15 1/2`, 15.5],
    [`15-1/2"`, 15.5],
    [`15 1/2 in`, 15.5],
    [`3'`, 36],
    [`3 ft`, 36],
    [`3 ft 2 in`, 38],
    [`1/2"`, 0.5],
    [`1'-0"`, 12],
    [`2′ 4″`, 28],
    [`0'-11 15/16"`, 11 + 15 / 16],
  ])('%s → %f in', (text, inches) => {
    expect(mm(text)).toBeCloseTo(inch(inches), 9);
  });

  it('reads a bare number as inches in ft-in mode and as mm in mm mode', () => {
    expect(mm('394.5', 'ft-in')).toBeCloseTo(inch(394.5), 9);
    expect(mm('394.5', 'mm')).toBe(394.5);
  });

  it('treats a leading minus as negative and a dash after the feet as a separator', () => {
    expect(mm(`-1'-3"`)).toBeCloseTo(-inch(15), 9);
    expect(mm(`−2"`)).toBeCloseTo(-inch(2), 9);
    expect(mm(`1'-3"`)).toBeCloseTo(inch(15), 9);
  });
});

describe('parseLength: metric', () => {
  it.each([
    ['394.5', 394.5],
    ['394.5 mm', 394.5],
    ['394.5mm', 394.5],
    ['39.45 cm', 394.5],
    ['0.3945 m', 394.5],
    ['.5 m', 500],
    ['-12 mm', -12],
    ['  1200  ', 1200],
  ])('%s → %f mm', (text, expected) => {
    expect(mm(text, 'mm')).toBeCloseTo(expected, 9);
  });

  it('units typed win over the default', () => {
    expect(mm('394.5 mm', 'ft-in')).toBe(394.5);
    expect(mm('15.5"', 'mm')).toBeCloseTo(393.7, 9);
  });
});

describe('parseLength: bad input gets a clear message, never a throw', () => {
  it.each([
    ['', 'Enter a length'],
    ['   ', 'Enter a length'],
    ['abc', 'Could not read'],
    ['1/0"', 'bottom number cannot be 0'],
    [`1'13"`, 'under 12'],
    ['3 5/4"', 'less than 1'],
    ['1,200', 'comma'],
    ['-', 'no number'],
    ['12 furlongs', 'Could not read'],
    ['1..2', 'Could not read'],
    ['15 1/2', 'fraction'],
  ])('%j → message containing %j', (text, fragment) => {
    const r = parseLength(text, 'mm');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });

  it('refuses numbers too large to be lengths', () => {
    expect(parseLength('1e400', 'mm').ok).toBe(false);
    expect(parseLength('9'.repeat(400), 'mm').ok).toBe(false);
  });
});
