import type { SceneBounds } from './scene-bounds';

/**
 * The camera's framing rules, without three: how far back a view must stand to show the whole
 * spool, and when a change to the model may move the camera (a user who orbited or zoomed to
 * work keeps their view).
 */

/** Distance from the model's centre that shows its bounding sphere, scene units. */
export function framingDistance(bounds: Pick<SceneBounds, 'radius'>, vfovRad: number, aspect: number): number {
  // The narrower of the two angles decides (a tall, narrow canvas on a phone).
  const fov = Math.min(vfovRad, 2 * Math.atan(Math.tan(vfovRad / 2) * aspect));
  // A bounding sphere frames loosely: 0.85 of the exact distance fills the view without
  // cropping a spool, whose box never fills the whole sphere.
  return (bounds.radius / Math.sin(fov / 2)) * 0.85;
}

/** A key that changes when the model's framing would (centre or size), to 1 mm. */
export function boundsKey(bounds: Pick<SceneBounds, 'centre' | 'radius'>): string {
  return `${bounds.centre.map((v) => v.toFixed(3)).join(',')}|${bounds.radius.toFixed(3)}`;
}

/** When to refit: after each fit the camera follows the model until the user moves it. */
export class CameraFitPolicy {
  private moved = false;
  private lastKey: string | null = null;

  /** The camera was just fitted to the model with `key`. */
  fitted(key: string): void {
    this.moved = false;
    this.lastKey = key;
  }

  /** The user orbited, zoomed or stepped the camera. */
  userMoved(): void {
    this.moved = true;
  }

  /** Whether the model, now with bounds `key`, should be fitted again. */
  shouldRefit(key: string): boolean {
    return !this.moved && key !== this.lastKey;
  }
}
