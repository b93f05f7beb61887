import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { branchDirectionFromOrientation, clockReference } from '../../../../shared/engine/clock-angles';
import { describeDirection } from './plant-directions';
import { tidy } from './vector';

/**
 * Words for an angle around a header, the way the document measures it (degrees clockwise
 * looking along the header's run direction, `shared/engine/clock-angles.ts`): every angle
 * says what 0° is. On a horizontal or sloping header 0° is the top of the pipe; on a
 * vertical header there is no top, and 0° is plant north.
 */
export type OrientationReference = {
  /** 'top of pipe' (plant vertical) or 'plant north' (vertical header). */
  zero: 'top of pipe' | 'plant north';
  /** How the angle is read: "clockwise looking along the run (East)". */
  sense: string;
  /** A field label: "Orientation, ° clockwise looking along the run (East); 0° = top of pipe". */
  fieldLabel: string;
};

/** The reference of orientation angles around a header running in `headerDirection`. */
export function orientationReference(headerDirection: Vec3): OrientationReference {
  const { reference } = clockReference(unit(headerDirection));
  const zero = reference === 'plant-north' ? 'plant north' : 'top of pipe';
  const sense = `clockwise looking along the run (${describeDirection(headerDirection)})`;
  const note = reference === 'plant-north' ? ' (the run is vertical)' : '';
  return { zero, sense, fieldLabel: `Orientation, ° ${sense}; 0° = ${zero}${note}` };
}

/**
 * An orientation with its reference and where it points:
 * "90° clockwise from plant north, looking along the run (Up): points East".
 */
export function describeOrientation(headerDirection: Vec3, orientationDeg: number): string {
  const ref = orientationReference(headerDirection);
  const points = describeDirection(tidy(branchDirectionFromOrientation(headerDirection, orientationDeg)));
  const deg = Number(orientationDeg.toFixed(1));
  return `${deg}° clockwise from ${ref.zero}, looking along the run (${describeDirection(headerDirection)}): points ${points}`;
}

function unit(v: Vec3): Vec3 {
  const l = Math.hypot(v.x, v.y, v.z) || 1;
  return { x: v.x / l, y: v.y / l, z: v.z / l };
}
