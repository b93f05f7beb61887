/**
 * Where a saddle-cut branch pipe meets its header: the distances from the header axis,
 * along the branch axis, to the branch's longest and shortest generators. Axes intersect.
 */

/**
 * For a branch of outside radius `r` on a header of outside radius `R` (mm), axes meeting
 * at `angleDeg` (90 = square), the distance along the branch axis from the header axis to
 * where each generator meets the header surface:
 * t(θ) = (√(R² − r²·sin²θ) − r·cosθ·cosβ) / sinβ.
 * `longPointMm` is the smallest t (the generator reaching deepest: the flank of a square
 * branch), `shortPointMm` the largest (the crotch). null when r > R.
 */
export function setOnBranchReach(
  R: number,
  r: number,
  angleDeg: number,
): { longPointMm: number; shortPointMm: number } | null {
  if (!(r > 0) || !(R > 0) || r > R + 1e-9) return null;
  const beta = (angleDeg * Math.PI) / 180;
  const sb = Math.sin(beta);
  const cb = Math.cos(beta);
  if (sb < 1e-6) return null;
  const t = (theta: number) => {
    const s = Math.sin(theta);
    return (Math.sqrt(Math.max(0, R * R - r * r * s * s)) - r * Math.cos(theta) * cb) / sb;
  };
  if (Math.abs(cb) < 1e-12) return { longPointMm: Math.sqrt(Math.max(0, R * R - r * r)), shortPointMm: R };
  // Sample, then refine the minimum and maximum by golden-section search.
  const N = 72;
  let iMin = 0;
  let iMax = 0;
  let vMin = Infinity;
  let vMax = -Infinity;
  for (let i = 0; i < N; i++) {
    const v = t((2 * Math.PI * i) / N);
    if (v < vMin) [vMin, iMin] = [v, i];
    if (v > vMax) [vMax, iMax] = [v, i];
  }
  const step = (2 * Math.PI) / N;
  return {
    longPointMm: refine(t, (iMin - 1) * step, (iMin + 1) * step, 1),
    shortPointMm: refine(t, (iMax - 1) * step, (iMax + 1) * step, -1),
  };
}

function refine(f: (x: number) => number, a: number, b: number, sign: 1 | -1): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let lo = a;
  let hi = b;
  for (let k = 0; k < 40; k++) {
    const x1 = hi - g * (hi - lo);
    const x2 = lo + g * (hi - lo);
    if (sign * f(x1) < sign * f(x2)) hi = x2;
    else lo = x1;
  }
  return f((lo + hi) / 2);
}
