/**
 * Stable codes of engine issues. UIs may key messages or icons on them; never rename one.
 */
export const ISSUE_CODES = [
  'invalid-design',
  'unknown-node',
  'duplicate-id',
  'no-root',
  'several-roots',
  'cycle',
  'disconnected',
  'run-to-self',
  'wrong-connection-count',
  'angle-not-made',
  'direction-mismatch',
  'size-mismatch',
  'size-unknown',
  'standard-data-missing',
  'overlapping-fittings',
  'piece-too-short',
  'piece-shorter-than-diameter',
  'length-kind-mismatch',
  'flange-not-two-holed',
  'flange-rotation-mismatch',
  'cut-elbow',
  'weight-incomplete',
  'orientation-missing',
  'internal-error',
  'standard-data-unconfirmed',
  'angle-pulled',
  'bend-too-small',
  'mitre-segment-short',
  'mitre-outside-code',
  'close-coupled-gap',
  'pipe-inside-hub',
  'weld-toes-close',
] as const;

/** One issue code. */
export type IssueCode = (typeof ISSUE_CODES)[number];
