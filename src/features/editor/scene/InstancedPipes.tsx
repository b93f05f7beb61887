import { useLayoutEffect, useMemo, useRef } from 'react';
import { Color, Matrix4, Vector3, type InstancedMesh } from 'three';
import type { ThreeEvent } from '@react-three/fiber';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, segmentPose, toVector3 } from './scene-units';
import { UNIT_CYLINDER } from './shared-geometries';

/** One straight pipe of an instanced set, plant mm. */
export type PipeInstance = { from: Vec3; to: Vec3; odMm: number; colour: string };

const matrix = new Matrix4();
const scaleV = new Vector3();
const colour = new Color();

/**
 * Every pipe piece in one draw call: a unit cylinder per piece, placed between its two
 * end faces and scaled to its OD. Clicks report the piece index and the picked point (scene units).
 */
export function InstancedPipes({ items, onPick }: { items: PipeInstance[]; onPick: (index: number, point: Vector3) => void }) {
  const ref = useRef<InstancedMesh>(null);
  const capacity = useMemo(() => Math.max(1, items.length), [items.length]);
  useLayoutEffect(() => {
    const mesh = ref.current;
    if (!mesh) return;
    let n = 0;
    items.forEach((p, i) => {
      const pose = segmentPose(toVector3(p.from), toVector3(p.to));
      const r = mmToScene(p.odMm / 2);
      // A zero-length piece still takes its slot (indices match pieces) but has no size.
      if (pose) matrix.compose(pose.position, pose.quaternion, scaleV.set(r, pose.length, r));
      else matrix.makeScale(0, 0, 0);
      mesh.setMatrixAt(i, matrix);
      mesh.setColorAt(i, colour.set(p.colour));
      n = i + 1;
    });
    mesh.count = n;
    mesh.instanceMatrix.needsUpdate = true;
    if (mesh.instanceColor) mesh.instanceColor.needsUpdate = true;
    mesh.computeBoundingSphere();
  }, [items]);
  return (
    <instancedMesh
      key={capacity}
      ref={ref}
      args={[UNIT_CYLINDER, undefined, capacity]}
      onClick={(e: ThreeEvent<MouseEvent>) => {
        if (e.delta > 5 || e.instanceId === undefined) return;
        e.stopPropagation();
        onPick(e.instanceId, e.point);
      }}
    >
      <meshStandardMaterial metalness={0.35} roughness={0.55} />
    </instancedMesh>
  );
}
