import type { ComponentResult, FlangeOrientation } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { ElbowMesh } from './ElbowMesh';
import { FlangeMesh } from './FlangeMesh';
import { FrustumSegment } from './FrustumSegment';
import { PipeSegment, type PickHandler } from './PipeSegment';
import { toScene, mmToScene } from './scene-units';
import { UNIT_SPHERE } from './shared-geometries';

function negate(v: Vec3): Vec3 {
  return { x: -v.x, y: -v.y, z: -v.z };
}

function along(p: Vec3, dir: Vec3, mm: number): Vec3 {
  return { x: p.x + dir.x * mm, y: p.y + dir.y * mm, z: p.z + dir.z * mm };
}

/**
 * One fitting drawn from the engine's shape data, true size. Pipe is drawn by the
 * pieces, so set-on branches and open ends add nothing here (their work point marker
 * is what the user picks).
 */
export function ComponentMesh({
  component,
  flange,
  colour,
  onClick,
}: {
  component: ComponentResult;
  flange: FlangeOrientation | undefined;
  colour: string;
  onClick: PickHandler;
}) {
  const shape = component.shape;
  const [e0, e1] = component.ends;
  const od = e0?.odMm ?? null;
  switch (shape.type) {
    case 'elbow':
      if (!e0 || !e1 || !od) return null;
      return (
        <ElbowMesh
          arcCentre={shape.arcCentre}
          a={e0.point}
          b={e1.point}
          bendRadiusMm={shape.bendRadiusMm}
          angleDeg={shape.angleDeg}
          odMm={od}
          planeNormal={shape.planeNormal}
          colour={colour}
          onClick={onClick}
        />
      );
    case 'return':
      if (!e0 || !e1 || !od) return null;
      return (
        <ElbowMesh
          arcCentre={shape.arcCentre}
          a={e0.point}
          b={e1.point}
          bendRadiusMm={shape.bendRadiusMm}
          angleDeg={180}
          odMm={od}
          planeNormal={shape.planeNormal}
          sweepHint={negate(e0.outward)}
          colour={colour}
          onClick={onClick}
        />
      );
    case 'tee':
      return (
        <group>
          {component.ends.map((e, i) =>
            e.odMm ? <PipeSegment key={i} from={component.position} to={e.point} odMm={e.odMm} colour={colour} onClick={onClick} /> : null,
          )}
        </group>
      );
    case 'branch-connection': {
      const branchEnd = component.ends.find((e) => Math.abs(e.outward.x * shape.branchAxis.x + e.outward.y * shape.branchAxis.y + e.outward.z * shape.branchAxis.z) > 0.99);
      const header = component.ends.find((e) => e !== branchEnd);
      if (!branchEnd?.odMm) return null;
      const base = along(component.position, shape.branchAxis, (header?.odMm ?? 0) * 0.35);
      return <PipeSegment from={base} to={branchEnd.point} odMm={branchEnd.odMm * 1.45} colour={colour} onClick={onClick} />;
    }
    case 'reducer':
      if (!shape.largeOdMm || !shape.smallOdMm) return null;
      return (
        <FrustumSegment from={shape.largeEnd} to={shape.smallEnd} fromOdMm={shape.largeOdMm} toOdMm={shape.smallOdMm} colour={colour} onClick={onClick} />
      );
    case 'flange':
      if (!shape.odMm || !shape.thicknessMm) return null;
      return (
        <FlangeMesh
          faceCentre={shape.faceCentre}
          outward={shape.outward}
          odMm={shape.odMm}
          thicknessMm={shape.thicknessMm}
          hubLengthMm={shape.hubLengthMm}
          pipeOdMm={od ?? shape.odMm / 2}
          boltCircleMm={shape.boltCircleMm}
          boltCount={shape.boltCount}
          firstHoleDirection={flange?.firstHoleDirection ?? null}
          blind={shape.blind}
          colour={colour}
          onClick={onClick}
        />
      );
    case 'cap':
      if (!e0 || !od) return null;
      return (
        <FrustumSegment
          from={e0.point}
          to={component.position}
          fromOdMm={od}
          toOdMm={od * 0.55}
          colour={colour}
          onClick={onClick}
        />
      );
    case 'socket-fitting': {
      const size = Math.max(...component.ends.map((e) => e.odMm ?? 0), 20) * 0.9;
      return (
        <mesh geometry={UNIT_SPHERE} position={toScene(component.position)} scale={mmToScene(size)} onClick={onClick}>
          <meshStandardMaterial color={colour} />
        </mesh>
      );
    }
    case 'set-on-branch':
    case 'open-end':
      return null;
  }
}

/** The small sphere at a work point, for picking nodes that have no body of their own. */
export function WorkPointMarker({ position, sizeMm, colour, onClick }: { position: Vec3; sizeMm: number; colour: string; onClick: PickHandler }) {
  return (
    <mesh geometry={UNIT_SPHERE} position={toScene(position)} scale={mmToScene(sizeMm)} onClick={onClick}>
      <meshBasicMaterial color={colour} />
    </mesh>
  );
}

