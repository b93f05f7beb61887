import { describe, expect, it } from 'vitest';
import { segmentMeetsRect } from '../../../server/modules/sheets/pdf/iso-drawing';

// The CoG label must not sit on a pipe line: plain geometry, no source needed.
const box = { x: 10, y: 10, w: 20, h: 10 };

describe('segmentMeetsRect', () => {
  it('sees a line through the box, along its edge within the padding, and one ending inside', () => {
    expect(segmentMeetsRect({ x: 0, y: 15 }, { x: 50, y: 15 }, box, 0)).toBe(true);
    expect(segmentMeetsRect({ x: 0, y: 8 }, { x: 50, y: 8 }, box, 3)).toBe(true);
    expect(segmentMeetsRect({ x: 20, y: 15 }, { x: 20, y: 100 }, box, 0)).toBe(true);
    expect(segmentMeetsRect({ x: 0, y: 0 }, { x: 40, y: 30 }, box, 0)).toBe(true);
  });

  it('misses a line beside the box, one that stops short, and a diagonal past the corner', () => {
    expect(segmentMeetsRect({ x: 0, y: 8 }, { x: 50, y: 8 }, box, 1)).toBe(false);
    expect(segmentMeetsRect({ x: 0, y: 15 }, { x: 9, y: 15 }, box, 0)).toBe(false);
    expect(segmentMeetsRect({ x: 0, y: 30 }, { x: 10, y: 40 }, box, 2)).toBe(false);
    expect(segmentMeetsRect({ x: 35, y: 0 }, { x: 50, y: 12 }, box, 2)).toBe(false);
  });
});
