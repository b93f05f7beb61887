import { CylinderGeometry, OctahedronGeometry, SphereGeometry } from 'three';

/**
 * Unit geometries shared by every mesh of their kind (scaled per mesh), so a 300-piece
 * spool allocates a handful of buffers, not hundreds. Never dispose these.
 */
export const UNIT_CYLINDER = new CylinderGeometry(1, 1, 1, 32, 1, false);
export const UNIT_CYLINDER_LOW = new CylinderGeometry(1, 1, 1, 12, 1, false);
export const UNIT_SPHERE = new SphereGeometry(1, 16, 12);
export const UNIT_OCTAHEDRON = new OctahedronGeometry(1);
