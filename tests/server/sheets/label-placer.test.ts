import { describe, expect, it } from 'vitest';
import { LabelPlacer } from '../../../server/modules/sheets/pdf/label-placer';

// Behaviour of the drawing's label placement (no reference values: placement rules of our own).
describe('LabelPlacer', () => {
  const area = { x: 100, y: 50, w: 400, h: 300 };

  it('takes the first free candidate and then avoids what it reserved', () => {
    const placer = new LabelPlacer(area);
    const a = { x: 200, y: 100, w: 30, h: 10 };
    const b = { x: 300, y: 100, w: 30, h: 10 };
    expect(placer.place([a, b])).toBe(0);
    // a is now taken: the same choice again goes to b.
    expect(placer.place([a, b])).toBe(1);
  });

  it('picks the least covered candidate when none is free, by overlapping area', () => {
    const placer = new LabelPlacer(area);
    placer.reserve({ x: 200, y: 100, w: 30, h: 10 }); // covers all of candidate 0
    placer.reserve({ x: 300, y: 100, w: 3, h: 10 }); // covers a tenth of candidate 1
    placer.reserve({ x: 401, y: 101, w: 15, h: 5 }); // covers a quarter of candidate 2
    const pick = placer.place([
      { x: 200, y: 100, w: 30, h: 10 },
      { x: 300, y: 100, w: 30, h: 10 },
      { x: 401, y: 101, w: 30, h: 10 },
    ]);
    expect(pick).toBe(1);
  });

  it('keeps labels inside the drawing area', () => {
    const placer = new LabelPlacer(area);
    expect(
      placer.place([
        { x: 90, y: 100, w: 30, h: 10 }, // a third outside on the left
        { x: 150, y: 100, w: 30, h: 10 },
      ]),
    ).toBe(1);
  });

  it('sees a small box reserved off the 4 pt cell grid', () => {
    const placer = new LabelPlacer(area);
    placer.reserve({ x: 251.5, y: 201.5, w: 6, h: 6 });
    // Candidate 0 is clear of it by 1 pt; candidate 1 overlaps it by 1 pt² only.
    expect(
      placer.place([
        { x: 258.5, y: 190, w: 20, h: 10 },
        { x: 256.5, y: 206.5, w: 20, h: 10 },
      ]),
    ).toBe(0);
  });
});
