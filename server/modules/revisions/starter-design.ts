import {
  SPOOL_DESIGN_FORMAT,
  SPOOL_DESIGN_VERSION,
  type SpoolDesign,
} from '../../../shared/schemas/spool-design.schema';

/**
 * The design a spool's first draft starts from: one bevelled open end at the plant
 * origin, no runs. It passes spoolDesignSchema, so a fresh draft can be saved as is.
 */
export function starterDesign(spool: { mark: string; lineNumber: string }): SpoolDesign {
  return {
    format: SPOOL_DESIGN_FORMAT,
    version: SPOOL_DESIGN_VERSION,
    mark: spool.mark,
    description: spool.lineNumber,
    origin: { x: 0, y: 0, z: 0 },
    nodes: [{ id: 'n1', kind: 'end', end: { type: 'bevel' } }],
    runs: [],
  };
}
