import { describe, expect, it } from 'vitest';
import {
  nextRevisionLetter,
  revisionLetterAt,
  revisionLetterIndex,
} from '../../../../server/modules/revisions/revision-letter';

describe('revision letters', () => {
  it('starts at A and follows the highest letter used, not the count', () => {
    expect(nextRevisionLetter([])).toBe('A');
    expect(nextRevisionLetter(['A'])).toBe('B');
    expect(nextRevisionLetter(['C', 'A'])).toBe('D');
  });

  it('skips I and O, which read as 1 and 0 on a print', () => {
    expect(nextRevisionLetter(['H'])).toBe('J');
    expect(nextRevisionLetter(['N'])).toBe('P');
    expect(revisionLetterIndex('I')).toBe(-1);
  });

  it('rolls over from Z to AA, and from AZ to BA', () => {
    expect(revisionLetterAt(23)).toBe('Z');
    expect(nextRevisionLetter(['Z'])).toBe('AA');
    expect(nextRevisionLetter(['AZ'])).toBe('BA');
  });

  it('round-trips index and letter over the first thousand', () => {
    for (let i = 0; i < 1000; i++) expect(revisionLetterIndex(revisionLetterAt(i))).toBe(i);
  });

  it('ignores strings that are not revision letters', () => {
    expect(nextRevisionLetter(['a', '1', ''])).toBe('A');
  });
});
