/**
 * Colours of the 3D model, taken from the app's theme tokens (src/styles/index.css) so
 * the canvas matches the panels: steel for material, spark amber for the selection,
 * danger red for components with errors.
 */
export const SCENE_COLOURS = {
  background: '#e8ecf0', // steel-100
  pipe: '#8d9aa7', // steel-400
  fitting: '#6b7886', // steel-500
  flange: '#525e6b', // steel-600
  boltHole: '#121a23', // ink-900
  /** The first bolt hole, the one the rotation is measured to. */
  firstHole: '#1d4a8a', // state-issued-fg
  selected: '#f9ac35', // spark-400
  hovered: '#ffc766', // spark-300
  error: '#b3301f', // danger-600
  warning: '#c9740a', // spark-600
  weld: '#1b2631', // ink-800
  workPoint: '#364657', // ink-600
  gridCell: '#b3bec9', // steel-300
  gridSection: '#8d9aa7', // steel-400
  axisEast: '#b3301f',
  axisNorth: '#2f7d36',
  axisUp: '#1d4a8a',
  cog: '#43347f',
} as const;
