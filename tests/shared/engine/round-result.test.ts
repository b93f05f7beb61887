import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { roundEverything, roundResult } from '../../../shared/engine/round-result';
import { chainDesign, chainParams, numbersIn } from './helpers/random-design';

const SAMPLES = readdirSync('samples')
  .filter((f) => f.endsWith('.json'))
  .map((f) => JSON.parse(readFileSync(`samples/${f}`, 'utf8')) as unknown);

describe('roundResult', () => {
  // The fast pass names the fields it rounds; the generic pass rounds every number it finds.
  // They must agree, or a field was missed.
  it('rounds exactly what the generic deep pass rounds, on the samples and on random designs', () => {
    const designs = [...SAMPLES, ...fc.sample(chainParams, 60).map(chainDesign)];
    for (const d of designs) {
      const fast = roundResult(computeSpool(d, { round: false }));
      const generic = computeSpool(d, { round: false });
      roundEverything(generic);
      expect(fast).toEqual(generic);
    }
  });

  it('keeps at most 4 decimals and never -0', () => {
    const r = computeSpool(SAMPLES[0]);
    for (const [path, n] of numbersIn(r)) {
      expect(Math.abs(n * 1e4 - Math.round(n * 1e4)), path).toBeLessThan(1e-6);
      expect(Object.is(n, -0), path).toBe(false);
    }
  });
});
