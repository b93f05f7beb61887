import { describe, expect, it } from 'vitest';
import { Vector3 } from 'three';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import { bendPose } from '../../../../src/features/editor/scene/bend-pose';
import { sceneBounds } from '../../../../src/features/editor/scene/scene-bounds';
import { nearestRun } from '../../../../src/features/editor/scene/scene-lookups';
import { toVector3, SCENE_UNITS_PER_MM } from '../../../../src/features/editor/scene/scene-units';
import { readFileSync } from 'node:fs';
import path from 'node:path';

const SAMPLE = JSON.parse(readFileSync(path.resolve(import.meta.dirname, '../../../../samples/cw-201-s03-return-14in.json'), 'utf8'));

/** The torus point at sweep angle θ (local xy plane, radius R), placed by the pose. */
function torusPoint(pose: ReturnType<typeof bendPose>, radiusScene: number, thetaRad: number): Vector3 {
  return new Vector3(radiusScene * Math.cos(thetaRad), radiusScene * Math.sin(thetaRad), 0).applyQuaternion(pose.quaternion).add(pose.position);
}

describe('bendPose', () => {
  it("places every elbow of a real spool so its torus runs from one end of the engine's elbow to the other", () => {
    const result = computeSpool(SAMPLE);
    const elbows = result.components.filter((c) => c.shape.type === 'elbow');
    expect(elbows.length).toBe(2);
    for (const e of elbows) {
      if (e.shape.type !== 'elbow') continue;
      const pose = bendPose(e.shape.arcCentre, e.ends[0]!.point, e.ends[1]!.point, e.shape.planeNormal);
      const r = e.shape.bendRadiusMm * SCENE_UNITS_PER_MM;
      expect(torusPoint(pose, r, 0).distanceTo(toVector3(e.ends[0]!.point))).toBeLessThan(1e-6);
      const end = torusPoint(pose, r, (e.shape.angleDeg * Math.PI) / 180);
      expect(end.distanceTo(toVector3(e.ends[1]!.point))).toBeLessThan(1e-6);
    }
  });

  it('sweeps a 180° return through the side away from its legs', () => {
    // Return centred at the origin, legs leaving west from (0, ±R); the arc bulges east.
    const R = 229;
    const pose = bendPose({ x: 0, y: 0, z: 0 }, { x: 0, y: -R, z: 0 }, { x: 0, y: R, z: 0 }, { x: 0, y: 0, z: 1 }, { x: 1, y: 0, z: 0 });
    const mid = torusPoint(pose, R * SCENE_UNITS_PER_MM, Math.PI / 2);
    expect(mid.x).toBeCloseTo(R * SCENE_UNITS_PER_MM, 9);
    expect(torusPoint(pose, R * SCENE_UNITS_PER_MM, Math.PI).y).toBeCloseTo(R * SCENE_UNITS_PER_MM, 9);
  });
});

describe('scene lookups', () => {
  it('picks, of the runs a header piece spans, the one under the pointer', () => {
    const result = computeSpool(SAMPLE);
    // P1 spans R1 (flange to the set-on at 800) and R2 (set-on to the elbow).
    const p1 = result.pieces[0]!;
    expect(p1.runIds).toEqual(['R1', 'R2']);
    expect(nearestRun(result, p1.runIds, { x: 12400, y: 4500, z: 3200 })).toBe('R1');
    expect(nearestRun(result, p1.runIds, { x: 13500, y: 4500, z: 3200 })).toBe('R2');
  });

  it('frames the shipping envelope in metres, with a fallback for nothing', () => {
    const result = computeSpool(SAMPLE);
    const b = sceneBounds(result);
    const box = result.overall!.envelopeBox;
    expect(b.size[0]).toBeCloseTo(box.sizeMm.x / 1000, 9);
    expect(b.minZ).toBeCloseTo(box.min.z / 1000, 9);
    expect(sceneBounds(null)).toEqual({ centre: [0, 0, 0], size: [1, 1, 1], radius: 1, minZ: 0 });
  });
});
