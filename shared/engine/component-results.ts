/**
 * Turns node analyses and positions into drawable component results: each end's point
 * and outward direction, and the shape data a 3D scene or isometric needs.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { cachedPipeOdMm } from './standards-cache';
import type { ComponentEnd, ComponentResult, ComponentShape, OpenEnd } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeAnalysis } from './node-analysis';
import type { PlacedRun } from './place-runs';
import type { Nps } from '../standards/nps';
import { add, addScaled, cross, negate, normalise, UP } from './vec3-math';

function od(nps: Nps | null): number | null {
  return nps ? cachedPipeOdMm(nps) : null;
}

/** Builds the component list, in tree order. */
export function componentResults(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  positions: Map<string, Vec3>,
  massOf: (nodeId: string) => number | null,
): ComponentResult[] {
  const out: ComponentResult[] = [];
  for (const nodeId of graph.nodeOrder) {
    const a = analyses.get(nodeId);
    const wp = positions.get(nodeId);
    // A component of unknown size cannot be drawn; an error already says why.
    if (!a || !wp || a.nps === null) continue;
    const nps = a.nps;
    const ends: ComponentEnd[] = a.ends.map((e) => {
      const port = add(wp, e.portOffset);
      return {
        runId: e.conn.run.id,
        point: e.takeOffMm === null || e.pipeContinues ? port : addScaled(port, e.conn.outward, e.takeOffMm),
        outward: e.conn.outward,
        nps: e.nps ?? nps,
        odMm: od(e.nps),
        joint: e.joint,
        takeOffMm: e.takeOffMm,
      };
    });
    const d = a.detail;
    let shape: ComponentShape;
    switch (d.type) {
      case 'elbow': {
        const oa = a.ends[0]!.conn.outward;
        const ob = a.ends[1]!.conn.outward;
        const bis = normalise(add(oa, ob)) ?? oa;
        const R = d.bendRadiusMm ?? 0;
        const th = (d.angleDeg * Math.PI) / 180;
        shape = {
          type: 'elbow',
          arcCentre: addScaled(wp, bis, R / Math.cos(th / 2)),
          bendRadiusMm: R,
          angleDeg: d.angleDeg,
          construction: d.construction,
          mitreWelds: d.mitreWelds,
          planeNormal: normalise(cross(negate(oa), ob)) ?? UP,
        };
        break;
      }
      case 'return':
        shape = {
          type: 'return',
          arcCentre: wp,
          bendRadiusMm: d.bendRadiusMm ?? 0,
          centreToCentreMm: d.centreToCentreMm ?? 0,
          planeNormal: normalise(cross(a.ends[0]!.conn.outward, d.offset)) ?? UP,
        };
        break;
      case 'tee':
        shape = {
          type: 'tee',
          runAxis: a.ends[0]!.conn.outward,
          branchAxis: a.ends[2]!.conn.outward,
          branchNps: d.branchNps ?? nps,
        };
        break;
      case 'branch': {
        const branchNps = d.branchNps ?? nps;
        if (a.node.kind === 'set-on-branch') {
          shape = {
            type: 'set-on-branch',
            headerAxis: d.headerAxis,
            branchAxis: d.branchAxis ?? UP,
            branchNps,
            angleDeg: d.angleDeg ?? 90,
            orientationDeg: d.orientationDeg,
          };
        } else {
          shape = {
            type: 'branch-connection',
            headerAxis: d.headerAxis,
            branchAxis: d.branchAxis ?? UP,
            branchNps,
            orientationDeg: d.orientationDeg,
            heightMm: d.heightMm,
          };
          // An open socket or outlet: its face is an end with no run.
          if (d.branchAxis && !a.ends.some((e) => !e.pipeContinues)) {
            const headerOd = od(a.nps);
            ends.push({
              runId: null,
              point: addScaled(wp, d.branchAxis, (headerOd ?? 0) / 2 + (d.heightMm ?? 0)),
              outward: d.branchAxis,
              nps: branchNps,
              odMm: od(branchNps),
              joint: 'open',
              takeOffMm: null,
            });
          }
        }
        break;
      }
      case 'reducer': {
        const large = ends.find((e) => e.nps === d.largeNps) ?? ends[0]!;
        const small = ends.find((e) => e !== large) ?? ends[1]!;
        shape = {
          type: 'reducer',
          largeEnd: large.point,
          smallEnd: small.point,
          largeOdMm: od(d.largeNps),
          smallOdMm: od(d.smallNps),
          eccentric: d.eccentric,
          lengthMm: d.lengthMm,
        };
        break;
      }
      case 'flange':
        shape = {
          type: 'flange',
          faceCentre: wp,
          outward: negate(a.ends[0]!.conn.outward),
          odMm: d.odMm,
          thicknessMm: d.thicknessMm,
          hubLengthMm: d.hubLengthMm,
          boltCircleMm: d.boltCircleMm,
          boltCount: d.boltCount,
          blind: d.blind,
          raisedFaceMm: d.raisedFaceMm,
        };
        ends.push({
          runId: null,
          point: wp,
          outward: negate(a.ends[0]!.conn.outward),
          nps,
          odMm: d.odMm,
          joint: 'flange-face',
          takeOffMm: null,
        });
        break;
      case 'cap':
        shape = { type: 'cap', axis: negate(a.ends[0]!.conn.outward), lengthMm: d.lengthMm };
        break;
      case 'open-end':
        shape = { type: 'open-end', axis: negate(a.ends[0]!.conn.outward) };
        break;
      case 'socket-fitting':
        shape = { type: 'socket-fitting', fitting: d.fitting };
        break;
      default:
        shape = { type: 'open-end', axis: UP };
    }
    out.push({
      nodeId,
      kind: a.node.kind,
      description: a.description,
      nps: a.nps,
      position: wp,
      ends,
      shape,
      source: a.source,
      massKg: massOf(nodeId),
    });
  }
  return out;
}

/** Open ends of the spool with their centre-to-face from the nearest fitting. */
export function openEnds(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  positions: Map<string, Vec3>,
  placed: Map<string, PlacedRun>,
): OpenEnd[] {
  const out: OpenEnd[] = [];
  for (const nodeId of graph.nodeOrder) {
    const node = graph.nodes.get(nodeId);
    const a = analyses.get(nodeId);
    const wp = positions.get(nodeId);
    if (node?.kind !== 'end' || !a || !wp || a.role.kind !== 'end') continue;
    const run = a.role.conn.run;
    const p = placed.get(run.id);
    const other = run.from === nodeId ? run.to : run.from;
    out.push({
      nodeId,
      endType: node.end.type,
      facePoint: wp,
      outward: negate(a.role.conn.outward),
      fromNodeId: p ? other : null,
      centreToFaceMm: p ? p.workPointDistanceMm : null,
    });
  }
  return out;
}
