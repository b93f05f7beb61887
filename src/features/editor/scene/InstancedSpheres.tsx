import { useLayoutEffect, useMemo, useRef } from 'react';
import { Color, Matrix4, Quaternion, Vector3, type InstancedMesh } from 'three';
import type { ThreeEvent } from '@react-three/fiber';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, toVector3 } from './scene-units';
import { UNIT_SPHERE_LOW } from './shared-geometries';

/** One sphere of an instanced set. */
export type SphereInstance = { position: Vec3; radiusMm: number; colour: string };

const scratchMatrix = new Matrix4();
const scratchQuat = new Quaternion();
const scratchScale = new Vector3();
const scratchColour = new Color();

/**
 * Many small spheres (work-point markers) in one draw call. Clicks report the
 * instance index, ignoring the click that ends an orbit drag.
 */
export function InstancedSpheres({ items, onPick }: { items: SphereInstance[]; onPick?: (index: number) => void }) {
  const ref = useRef<InstancedMesh>(null);
  const count = items.length;
  const capacity = useMemo(() => Math.max(1, count), [count]);
  useLayoutEffect(() => {
    const mesh = ref.current;
    if (!mesh) return;
    items.forEach((it, i) => {
      const r = mmToScene(it.radiusMm);
      scratchMatrix.compose(toVector3(it.position), scratchQuat, scratchScale.set(r, r, r));
      mesh.setMatrixAt(i, scratchMatrix);
      mesh.setColorAt(i, scratchColour.set(it.colour));
    });
    mesh.count = count;
    mesh.instanceMatrix.needsUpdate = true;
    if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
    mesh.computeBoundingSphere();
  }, [items, count]);
  return (
    <instancedMesh
      key={capacity}
      ref={ref}
      args={[UNIT_SPHERE_LOW, undefined, capacity]}
      onClick={(e: ThreeEvent<MouseEvent>) => {
        if (e.delta > 5 || e.instanceId === undefined || !onPick) return;
        e.stopPropagation();
        onPick(e.instanceId);
      }}
    >
      <meshBasicMaterial />
    </instancedMesh>
  );
}
