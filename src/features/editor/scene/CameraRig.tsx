import { useEffect, useEffectEvent, useRef } from 'react';
import { useThree } from '@react-three/fiber';
import { Vector3 } from 'three';
import type { ViewPrefs, ViewPreset } from '../model/view-prefs';
import { boundsKey, CameraFitPolicy, framingDistance } from './camera-fit';
import type { SceneBounds } from './scene-bounds';

/** Plant up, the axis keyboard orbits turn about. */
const UP = new Vector3(0, 0, 1);

/** Where the camera looks from, per preset (plant axes, z up). */
const PRESET_DIRECTIONS: Record<ViewPreset, [number, number, number]> = {
  // Isometric from the south-east, above: the usual reading of a piping isometric.
  iso: [1, -1, 0.82],
  // Plan: from above, north up the screen (a hair of south so "up" stays defined).
  plan: [0, -0.0001, 1],
  // Elevation looking north: standing south of the spool.
  'elev-north': [0, -1, 0],
  // Elevation looking east: standing west of it.
  'elev-east': [-1, 0, 0],
};

type Controls = { target: Vector3; update: () => void };

/**
 * Puts the camera on a preset view framing the spool: when the preset is asked for
 * (again), the first time there is a model, and whenever the model's bounds change
 * (a run added) unless the user has orbited, zoomed or stepped the camera since the last
 * fit, so a user who zoomed in to work keeps their view while typing dimensions.
 */
export function CameraRig({
  preset,
  nonce,
  bounds,
  hasModel,
  step,
}: {
  preset: ViewPreset;
  nonce: number;
  bounds: SceneBounds;
  hasModel: boolean;
  step: ViewPrefs['cameraStep'];
}) {
  const get = useThree((s) => s.get);
  const controls = useThree((s) => s.controls) as unknown as Controls | null;
  const framedOnce = useRef(false);
  const policy = useRef(new CameraFitPolicy());

  // Reads the latest bounds without making them a reason to re-frame.
  const frame = useEffectEvent(() => {
    const { camera, invalidate } = get();
    if (!controls) return;
    if (!hasModel && framedOnce.current) return;
    const b = bounds;
    const vfov = 'fov' in camera ? ((camera as { fov: number }).fov * Math.PI) / 180 : Math.PI / 4;
    const aspect = 'aspect' in camera ? (camera as { aspect: number }).aspect : 1;
    const distance = framingDistance(b, vfov, aspect);
    const dir = new Vector3(...PRESET_DIRECTIONS[preset]).normalize();
    const centre = new Vector3(...b.centre);
    camera.position.copy(centre.clone().add(dir.multiplyScalar(distance)));
    camera.near = Math.max(0.005, distance / 1000);
    camera.far = distance * 50;
    camera.updateProjectionMatrix();
    controls.target.copy(centre);
    controls.update();
    if (hasModel) framedOnce.current = true;
    policy.current.fitted(boundsKey(b));
    invalidate();
  });

  // Re-frame on a preset request or when the first model arrives.
  useEffect(() => frame(), [preset, nonce, hasModel, controls]);

  // Orbit or zoom by the user ('start' fires on pointer and wheel input only).
  useEffect(() => {
    const c = controls as unknown as { addEventListener?: (t: string, f: () => void) => void; removeEventListener?: (t: string, f: () => void) => void } | null;
    if (!c?.addEventListener) return;
    const onStart = () => policy.current.userMoved();
    c.addEventListener('start', onStart);
    return () => c.removeEventListener?.('start', onStart);
  }, [controls]);

  // The model grew or shrank: fit it again, unless the user has a view of their own.
  const key = boundsKey(bounds);
  useEffect(() => {
    if (policy.current.shouldRefit(key)) frame();
  }, [key]);

  // A keyboard step: orbit about plant up through the target, tilt, zoom.
  const applyStep = useEffectEvent(() => {
    const { camera, invalidate } = get();
    if (!controls || step.nonce === 0) return;
    policy.current.userMoved();
    const offset = camera.position.clone().sub(controls.target);
    offset.applyAxisAngle(UP, (step.azimuthDeg * Math.PI) / 180);
    if (step.elevationDeg !== 0) {
      const side = new Vector3().crossVectors(UP, offset).normalize();
      const tilted = offset.clone().applyAxisAngle(side, (-step.elevationDeg * Math.PI) / 180);
      // Stop short of straight up or down, where "up" on the screen is undefined.
      if (Math.abs(tilted.clone().normalize().dot(UP)) < 0.995) offset.copy(tilted);
    }
    offset.multiplyScalar(step.zoom);
    camera.position.copy(controls.target).add(offset);
    controls.update();
    invalidate();
  });
  useEffect(() => applyStep(), [step.nonce]);

  return null;
}
