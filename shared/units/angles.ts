declare const unit: unique symbol;

/** An angle in degrees. Branded so a radian value cannot be passed by mistake. */
export type Degrees = number & { readonly [unit]: 'deg' };

/** An angle in radians. */
export type Radians = number & { readonly [unit]: 'rad' };

/** Marks a plain number as degrees. */
export function degrees(value: number): Degrees {
  return value as Degrees;
}

/** Marks a plain number as radians. */
export function radians(value: number): Radians {
  return value as Radians;
}

/** Degrees to radians. */
export function degToRad(deg: number): Radians {
  return ((deg * Math.PI) / 180) as Radians;
}

/** Radians to degrees. */
export function radToDeg(rad: number): Degrees {
  return ((rad * 180) / Math.PI) as Degrees;
}

/** Wraps an angle into [0, 360) degrees (−90 → 270, 360 → 0). */
export function normaliseDegrees(deg: number): Degrees {
  const r = deg % 360;
  const wrapped = r < 0 ? r + 360 : r;
  // -0 and 360 - tiny can both appear after floating arithmetic.
  return (wrapped === 0 || wrapped === 360 ? 0 : wrapped) as Degrees;
}

/** Wraps an angle into (−180, 180] degrees, for signed corrections (+ clockwise, say). */
export function normaliseSignedDegrees(deg: number): Degrees {
  const d = normaliseDegrees(deg);
  return (d > 180 ? d - 360 : d) as Degrees;
}
