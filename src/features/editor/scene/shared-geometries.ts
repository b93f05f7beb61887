import { CylinderGeometry, OctahedronGeometry, SphereGeometry, TorusGeometry } from 'three';

/**
 * Unit geometries shared by every mesh of their kind (scaled per mesh or instance), so a
 * 300-piece spool allocates a handful of buffers, not hundreds. Never dispose these.
 */
export const UNIT_CYLINDER = new CylinderGeometry(1, 1, 1, 24, 1, false);
export const UNIT_CYLINDER_LOW = new CylinderGeometry(1, 1, 1, 10, 1, false);
export const UNIT_SPHERE = new SphereGeometry(1, 16, 12);
/** Low-poly sphere for markers drawn by the hundred. */
export const UNIT_SPHERE_LOW = new SphereGeometry(1, 8, 5);
export const UNIT_OCTAHEDRON = new OctahedronGeometry(1);
/** Weld bead around a pipe of radius 1: a thin torus (tube 4 % of the radius). */
export const UNIT_WELD_BEAD = new TorusGeometry(1, 0.04, 3, 20);
