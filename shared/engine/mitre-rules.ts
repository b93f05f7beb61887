/**
 * Trade and code limits on mitred bends: the shortest segment the shop will fit, and the
 * ASME B31.3 limits on mitre cut angle and effective radius. The code limits are warnings:
 * whether a mitre is acceptable for a service is the engineer of record's call.
 */
import { addError, addWarning, type IssueSink } from './issues';

/** Largest mitre cut angle θ (half the change of direction at one joint) for full-rated service, degrees (ASME B31.3 304.2.3). */
export const MAX_MITRE_CUT_DEG = 22.5;

/**
 * ASME B31.3 304.2.3 eq. (5): the least effective radius R1 of a multiple mitre bend,
 * R1 = A / tan θ + D / 2, with A = 25 mm for T ≤ 13 mm, 2T for 13 < T < 22 mm, and
 * 2T/3 + 30 mm for T ≥ 22 mm (from memory: check against the code edition in force).
 * `cutDeg` θ, `wallMm` T, `odMm` D; result mm.
 */
export function minMitreRadiusMm(cutDeg: number, wallMm: number, odMm: number): number {
  const a = wallMm <= 13 ? 25 : wallMm < 22 ? 2 * wallMm : (2 * wallMm) / 3 + 30;
  return a / Math.tan((cutDeg * Math.PI) / 180) + odMm / 2;
}

/** What the mitre checks need to know about one mitred bend. */
export type MitreFacts = {
  /** Shop words for the bend (kind, size, label). */
  words: string;
  nodeId: string;
  welds: number;
  /** Mitre cut angle θ per joint, degrees. */
  cutDeg: number;
  /** Radius the bend is laid out on, mm. */
  radiusMm: number;
  /** Middle segment length along the centreline, mm (null: a single mitre). */
  segmentMm: number | null;
  /** Shop's shortest piece, mm. */
  minPieceMm: number;
  wallMm: number | null;
  odMm: number | null;
};

/** Checks one mitred bend, pushing errors (shop limits) and warnings (code limits). */
export function checkMitre(f: MitreFacts, issues: IssueSink): void {
  if (f.segmentMm !== null && f.segmentMm > 0 && f.segmentMm < f.minPieceMm) {
    addError(
      issues,
      'mitre-segment-short',
      `${f.words}: its ${f.welds - 1} middle segments would be ${r1(f.segmentMm)} mm long, shorter than the shop's ${r1(f.minPieceMm)} mm shortest piece: use fewer mitre welds or a larger radius`,
      f.nodeId,
    );
  }
  if (f.welds === 1 && f.cutDeg > MAX_MITRE_CUT_DEG + 1e-9) {
    addWarning(
      issues,
      'mitre-outside-code',
      `${f.words}: a single mitre cut at ${r1(f.cutDeg)}° (${r1(2 * f.cutDeg)}° change of direction) is beyond the 22.5° ASME B31.3 (304.2.3, 306.3) allows for full-rated service; larger single mitres are limited to low-pressure or Category D service: the engineer of record must accept it`,
      f.nodeId,
    );
  }
  if (f.welds > 1 && f.wallMm !== null && f.odMm !== null) {
    const min = minMitreRadiusMm(f.cutDeg, f.wallMm, f.odMm);
    if (f.radiusMm < min) {
      addWarning(
        issues,
        'mitre-outside-code',
        `${f.words}: radius ${r1(f.radiusMm)} mm with ${f.welds} welds (cut ${r1(f.cutDeg)}°) is below the ${r1(min)} mm least effective radius of ASME B31.3 304.2.3: the engineer of record must accept it`,
        f.nodeId,
      );
    }
  }
}

function r1(x: number): number {
  return Math.round(x * 10) / 10;
}
