import { useLayoutEffect, useMemo, useRef } from 'react';
import { Color, Matrix4, Quaternion, Vector3, type InstancedMesh } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, toVector3 } from './scene-units';
import { UNIT_WELD_BEAD } from './shared-geometries';

/** One weld bead: centre, pipe axis and the pipe OD. */
export type WeldRingInstance = { position: Vec3; axis: Vec3; odMm: number; colour: string };

const Z_AXIS = new Vector3(0, 0, 1);
const m = new Matrix4();
const q = new Quaternion();
const s = new Vector3();
const c = new Color();

/**
 * Every weld of the spool as a bead around its pipe, in one draw call. The unit bead is
 * a torus of radius 1 in the xy plane, scaled to the pipe radius and turned onto the axis.
 */
export function InstancedWeldRings({ items }: { items: WeldRingInstance[] }) {
  const ref = useRef<InstancedMesh>(null);
  const capacity = useMemo(() => Math.max(1, items.length), [items.length]);
  useLayoutEffect(() => {
    const mesh = ref.current;
    if (!mesh) return;
    items.forEach((w, i) => {
      const r = mmToScene(w.odMm / 2) * 1.02;
      q.setFromUnitVectors(Z_AXIS, toVector3(w.axis).normalize());
      // The bead's thickness scales with the radius too; z keeps it a thin ring.
      m.compose(toVector3(w.position), q, s.set(r, r, r));
      mesh.setMatrixAt(i, m);
      mesh.setColorAt(i, c.set(w.colour));
    });
    mesh.count = items.length;
    mesh.instanceMatrix.needsUpdate = true;
    if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
    mesh.computeBoundingSphere();
  }, [items]);
  return (
    <instancedMesh key={capacity} ref={ref} args={[UNIT_WELD_BEAD, undefined, capacity]}>
      <meshStandardMaterial roughness={0.9} />
    </instancedMesh>
  );
}
