import { describe, expect, it } from 'vitest';
import { describeOrientation, orientationReference } from '../../../../src/features/editor/model/orientation-words';

const EAST = { x: 1, y: 0, z: 0 };
const NORTH = { x: 0, y: 1, z: 0 };
const UP = { x: 0, y: 0, z: 1 };

// Clockwise looking along the run: someone facing along a horizontal run has 0° (top) at
// 12 o'clock and 90° on the right hand: facing north that is east, facing east it is south
// (plain geometry, no source needed). On a vertical run 0° is plant north (document rule).
describe('orientation words', () => {
  it('a horizontal run measures from the top of pipe', () => {
    expect(orientationReference(EAST).zero).toBe('top of pipe');
    expect(orientationReference(EAST).fieldLabel).toBe('Orientation, ° clockwise looking along the run (East); 0° = top of pipe');
    expect(describeOrientation(NORTH, 90)).toBe('90° clockwise from top of pipe, looking along the run (North): points East');
    expect(describeOrientation(EAST, 90)).toMatch(/points South$/);
    expect(describeOrientation(EAST, 0)).toMatch(/points Up$/);
  });

  it('a vertical run measures from plant north and says so', () => {
    const ref = orientationReference(UP);
    expect(ref.zero).toBe('plant north');
    expect(ref.fieldLabel).toContain('0° = plant north (the run is vertical)');
    expect(describeOrientation(UP, 0)).toBe('0° clockwise from plant north, looking along the run (Up): points North');
    expect(describeOrientation(UP, 180)).toMatch(/points South$/);
  });
});
