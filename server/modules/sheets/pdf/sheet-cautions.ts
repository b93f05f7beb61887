/**
 * Safety cautions printed on every spool sheet, saw list and template page. They state where
 * Tackline's figures stop and qualified people and the applicable codes take over.
 */
export const SHEET_CAUTIONS: readonly string[] = [
  'Lifting: weights and centres of gravity on this sheet are estimates. Every lift is planned by a competent person, with rigging chosen for the actual load.',
  'Hot work (cutting, grinding, welding) needs the shop’s hot-work permit, the right PPE and fume control.',
  'Pressure tests store energy: keep the exclusion zone clear and follow the written test procedure.',
  'Pressure ratings, wall thickness and test pressures are the engineer of record’s. Tackline’s figures support, and do not replace, the applicable code and licensed practice.',
];

/** One-line form for pages with little room (templates, saw list footers). */
export const SHORT_CAUTION =
  'Weights and CoG are estimates: lifts planned by a competent person. Hot work needs a permit, PPE and fume control. Figures support, not replace, the applicable code and the engineer of record.';
