import { useDeferredValue, useMemo, useRef, useState, type RefObject } from 'react';
import { Canvas } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import type { Group } from 'three';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { LengthUnits } from '../../../../shared/units/length-format';
import type { Selection } from '../model/editor-selection';
import type { ViewPrefs } from '../model/view-prefs';
import { CameraRig } from './CameraRig';
import { CentreOfGravityMarker } from './CentreOfGravityMarker';
import { buildLabelItems, LabelOverlay, LabelProjector } from './DimensionLabels';
import { groundLabelItems, PlantGround } from './PlantGround';
import { sceneBounds } from './scene-bounds';
import { largestOd } from './scene-lookups';
import { SCENE_COLOURS } from './scene-palette';
import { SCENE_STATS_ENABLED, SceneStats } from './SceneStats';
import { SpoolModel } from './SpoolModel';
import { isSoftwareWebGl } from './gl-capabilities';
import { NextRunPreview } from './NextRunPreview';
import { toScene } from './scene-units';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/**
 * The 3D view: renders only when something changes (`frameloop="demand"`), orbit, pan
 * and zoom with the mouse, touch or trackpad; preset views from the toolbar. The model
 * group is handed out through `modelRef` for the glTF export.
 */
export default function SpoolCanvas({
  result: liveResult,
  design: liveDesign,
  selection,
  view,
  units,
  onSelect,
  modelRef,
  nextRun,
}: {
  result: SpoolResult | null;
  design: SpoolDesign | null;
  selection: Selection;
  view: ViewPrefs;
  units: LengthUnits;
  onSelect: (selection: Selection) => void;
  modelRef?: RefObject<Group | null>;
  /** The run the build bar would add: drawn as an arrow from its open end. */
  nextRun?: { from: Vec3; direction: Vec3; lengthMm: number | null; valid: boolean } | null;
}) {
  // The panels (cut list) update in the same moment as the keystroke; the scene follows in
  // a deferred render so a large model never holds the numbers back.
  const result = useDeferredValue(liveResult);
  const design = useDeferredValue(liveDesign);
  // Html labels follow the camera every frame: hide them while the user orbits (only
  // once the camera really moves, so a click to select does not make them blink).
  const [orbiting, setOrbiting] = useState(false);
  const pointerDown = useRef(false);
  const bounds = useMemo(() => sceneBounds(result), [result]);
  const softwareGl = useMemo(() => isSoftwareWebGl(), []);
  const cogMm = useMemo(() => (result ? Math.max(30, largestOd(result) * 0.35) : 30), [result]);
  const cog = result?.weights.centreOfGravity ?? null;
  const overlayRef = useRef<HTMLDivElement | null>(null);
  const labelItems = useMemo(
    () => [
      ...groundLabelItems(bounds),
      ...(result && design
        ? buildLabelItems({
            result,
            design,
            labels: view.labels,
            units,
            selection,
            cog:
              cog && view.showCentreOfGravity
                ? {
                    at: toScene({ x: cog.x, y: cog.y, z: cog.z + cogMm * 2.2 }),
                    emptyKg: result.weights.emptyKg,
                  }
                : null,
          })
        : []),
    ],
    [bounds, result, design, view.labels, view.showCentreOfGravity, units, selection, cog, cogMm],
  );
  return (
    <>
      <Canvas
        frameloop="demand"
        dpr={softwareGl ? 1 : [1, 2]}
        camera={{ fov: 35, up: [0, 0, 1], position: [4, -4, 3], near: 0.01, far: 500 }}
        onPointerMissed={() => onSelect(null)}
        gl={{ antialias: !softwareGl }}
        aria-label="3D model of the spool"
      >
        <color attach="background" args={[SCENE_COLOURS.background]} />
        <hemisphereLight args={['#ffffff', '#8d9aa7', 1.1]} />
        <directionalLight position={[5, -8, 10]} intensity={1.6} />
        <directionalLight position={[-6, 4, 3]} intensity={0.5} />
        <OrbitControls
          makeDefault
          enableDamping={false}
          onStart={() => {
            pointerDown.current = true;
          }}
          onChange={() => {
            if (pointerDown.current && !orbiting) setOrbiting(true);
          }}
          onEnd={() => {
            pointerDown.current = false;
            if (orbiting) setOrbiting(false);
          }}
        />
        <CameraRig
          preset={view.preset}
          nonce={view.presetNonce}
          step={view.cameraStep}
          bounds={bounds}
          hasModel={!!result && result.components.length > 0}
        />
        <PlantGround bounds={bounds} />
        {result ? (
          <group ref={modelRef} name="spool-model">
            <SpoolModel result={result} selection={selection} onSelect={onSelect} />
          </group>
        ) : null}
        <LabelProjector items={labelItems} overlayRef={overlayRef} />
        {result && cog && view.showCentreOfGravity ? (
          <CentreOfGravityMarker position={cog} sizeMm={cogMm} />
        ) : null}
        {nextRun ? (
          <NextRunPreview
            from={nextRun.from}
            direction={nextRun.direction}
            lengthMm={nextRun.lengthMm}
            valid={nextRun.valid}
          />
        ) : null}
        {SCENE_STATS_ENABLED ? <SceneStats /> : null}
      </Canvas>
      {/* Html labels follow the camera every frame: hidden (not unmounted) while the user orbits. */}
      <LabelOverlay items={labelItems} hidden={orbiting} overlayRef={overlayRef} />
    </>
  );
}
