import { describe, expect, it } from 'vitest';
import { boundsKey, CameraFitPolicy, framingDistance } from '../../../../src/features/editor/scene/camera-fit';

// The view must keep the whole spool in sight as runs are added (common practice for a
// modelling view, no source), without fighting a user who has set a view of their own.

const bounds = (radius: number, centre: [number, number, number] = [0, 0, 0]) => ({ centre, radius });
const FOV = (45 * Math.PI) / 180;

describe('CameraFitPolicy', () => {
  it('refits when a run changes the model bounds, as long as the user has not moved the camera', () => {
    const policy = new CameraFitPolicy();
    const first = boundsKey(bounds(1));
    expect(policy.shouldRefit(first)).toBe(true);
    policy.fitted(first);
    expect(policy.shouldRefit(first)).toBe(false);
    const grown = boundsKey(bounds(2.5, [1.2, 0, 0]));
    expect(policy.shouldRefit(grown)).toBe(true);
  });

  it('keeps the user’s view after an orbit, zoom or key step, until the next fit (a preset asked for)', () => {
    const policy = new CameraFitPolicy();
    policy.fitted(boundsKey(bounds(1)));
    policy.userMoved();
    expect(policy.shouldRefit(boundsKey(bounds(3)))).toBe(false);
    policy.fitted(boundsKey(bounds(3)));
    expect(policy.shouldRefit(boundsKey(bounds(4)))).toBe(true);
  });

  it('ignores changes below a millimetre (a typed dimension that rounds to the same model)', () => {
    expect(boundsKey(bounds(1.0000001))).toBe(boundsKey(bounds(1)));
    expect(boundsKey(bounds(1.002))).not.toBe(boundsKey(bounds(1)));
  });
});

describe('framingDistance', () => {
  it('grows with the model: twice the size, twice as far', () => {
    expect(framingDistance(bounds(2), FOV, 1.5)).toBeCloseTo(2 * framingDistance(bounds(1), FOV, 1.5), 9);
  });

  it('a phone-shaped canvas (narrow) stands further back than a wide one', () => {
    expect(framingDistance(bounds(1), FOV, 0.46)).toBeGreaterThan(framingDistance(bounds(1), FOV, 1.6));
    // Wide canvases are limited by the vertical angle: the same distance for any wider aspect.
    expect(framingDistance(bounds(1), FOV, 2)).toBeCloseTo(framingDistance(bounds(1), FOV, 3), 9);
  });

  it('puts the bounding sphere at the edge of the narrower view angle (0.85 of the exact fit)', () => {
    const d = framingDistance(bounds(1), FOV, 1.5);
    expect(1 / d).toBeCloseTo(Math.sin(FOV / 2) / 0.85, 9);
  });
});
