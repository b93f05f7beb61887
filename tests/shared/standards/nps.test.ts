import { describe, expect, it } from 'vitest';
import {
  compareNps,
  dnOf,
  isNps,
  NPS_VALUES,
  npsInches,
  npsSchema,
  smallerSizes,
} from '../../../shared/standards/nps';

describe('nps', () => {
  it('lists sizes smallest first', () => {
    for (let i = 1; i < NPS_VALUES.length; i++) {
      expect(compareNps(NPS_VALUES[i - 1]!, NPS_VALUES[i]!)).toBeLessThan(0);
    }
  });

  it('gives the nominal inches', () => {
    expect(npsInches('1-1/2')).toBe(1.5);
    expect(npsInches('3/4')).toBe(0.75);
    expect(npsInches('24')).toBe(24);
  });

  it('maps NPS to DN as ASME B36.10M lists them', () => {
    // ASME B36.10M / ISO 6708 designations.
    expect(dnOf('1/2')).toBe(15);
    expect(dnOf('1-1/4')).toBe(32);
    expect(dnOf('2-1/2')).toBe(65);
    expect(dnOf('14')).toBe(350);
    expect(dnOf('24')).toBe(600);
  });

  it('validates with a message listing the sizes', () => {
    expect(npsSchema.safeParse('6').success).toBe(true);
    const bad = npsSchema.safeParse('7');
    expect(bad.success).toBe(false);
    if (!bad.success) expect(bad.error.issues[0]?.message).toContain('1-1/2');
    expect(isNps('3-1/2')).toBe(false);
  });

  it('lists smaller sizes nearest first', () => {
    expect(smallerSizes('4').slice(0, 3)).toEqual(['3', '2-1/2', '2']);
    expect(smallerSizes('1/2')).toEqual([]);
  });
});
