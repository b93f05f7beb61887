/**
 * Take-offs of branch connections on a header that runs through unbroken: set-on branches
 * (saddle-cut pipe on pipe), socket-weld half couplings (ASME B16.11) and weld-on branch
 * outlets (height from the maker's catalogue). The header gets no take-off and no weld.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef } from './component-refs';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { cachedPipeOdMm } from './standards-cache';
import { compareNps, type Nps } from '../standards/nps';
import { socketWeldDimensions } from '../standards/socket-weld-fittings';
import type { Connection } from './classify-nodes';
import { branchDirectionFromOrientation, orientationOfBranch } from './clock-angles';
import { addError, addWarning } from './issues';
import { buttEnd, socketEnd, throughEnd } from './node-end-builders';
import type { NodeAnalysis, NodeContext, NodeEnd } from './node-analysis';
import { setOnBranchReach } from './set-on-branch-geometry';
import { mmText, noteUnconfirmed } from './unconfirmed-data';
import { negate } from './vec3-math';

type SetOnNode = Extract<SpoolNode, { kind: 'set-on-branch' }>;
type SmallBoreNode = Extract<SpoolNode, { kind: 'half-coupling' | 'branch-outlet' }>;

/** Smallest angle between a set-on branch and its header that the engine lays out, degrees. */
export const MIN_SET_ON_ANGLE_DEG = 30;

function headerAxis(a: Connection): Vec3 {
  return a.isParent ? negate(a.outward) : a.outward;
}

function odOf(nps: Nps | null): number | null {
  return nps ? cachedPipeOdMm(nps) : null;
}

/** Analyses a set-on branch: header legs `a`, `b`, branch leg `branch` at `angleDeg`. */
export function analyseSetOn(
  ctx: NodeContext,
  node: SetOnNode,
  a: Connection,
  b: Connection,
  branch: Connection,
  angleDeg: number,
): NodeAnalysis {
  const header = ctx.pipe(a.run.id);
  const br = ctx.pipe(branch.run.id);
  const h = headerAxis(a);
  const headerOd = header.dims?.odMm ?? odOf(header.nps);
  const branchOd = br.dims?.odMm ?? odOf(br.nps);
  let reach: ReturnType<typeof setOnBranchReach> = null;
  if (header.nps && br.nps && compareNps(br.nps, header.nps) > 0) {
    addError(
      ctx.issues,
      'size-mismatch',
      `${nodeRef(node.id)}: the branch (NPS ${br.nps}) is larger than its header (NPS ${header.nps})`,
      node.id,
    );
  } else if (angleDeg < MIN_SET_ON_ANGLE_DEG) {
    addError(
      ctx.issues,
      'angle-not-made',
      `${nodeRef(node.id)} meets its header at ${round(angleDeg)}°; below ${MIN_SET_ON_ANGLE_DEG}° the saddle cannot be fitted`,
      node.id,
    );
  } else if (headerOd && branchOd) {
    reach = setOnBranchReach(headerOd / 2, branchOd / 2, angleDeg);
  }
  const gap = ctx.specAt(branch.run.id).rootGapMm;
  const brEnd: NodeEnd = buttEnd(branch, br.nps, reach ? reach.longPointMm : null, gap, 'branch');
  brEnd.joint = 'set-on';
  brEnd.prep = 'saddle';
  brEnd.shortPointTakeOffMm = reach ? reach.shortPointMm : null;
  const orientationDeg = orientationOfBranch(h, branch.outward);
  const square = Math.abs(angleDeg - 90) <= ctx.angleToleranceDeg;
  return {
    node,
    role: ctx.role,
    nps: header.nps,
    ends: [throughEnd(a, header.nps), throughEnd(b, ctx.pipe(b.run.id).nps), brEnd],
    description: `Set-on branch NPS ${br.nps ?? '?'} on NPS ${header.nps ?? '?'}${square ? '' : ` at ${round(angleDeg)}°`}`,
    bom: null,
    source: 'saddle reach from the intersection of two cylinders (outside diameters, ASME B36.10M)',
    internalWelds: [],
    detail: {
      type: 'branch',
      branchNps: br.nps,
      angleDeg,
      orientationDeg,
      branchAxis: branch.outward,
      headerAxis: h,
      heightMm: null,
    },
  };
}

/** Analyses a half coupling or branch outlet: header legs `a`, `b`, optional `branch`. */
export function analyseSmallBore(
  ctx: NodeContext,
  node: SmallBoreNode,
  a: Connection,
  b: Connection,
  branch: Connection | null,
  angleDeg: number | null,
): NodeAnalysis {
  const header = ctx.pipe(a.run.id);
  const h = headerAxis(a);
  const tol = ctx.angleToleranceDeg;
  const headerOd = header.dims?.odMm ?? odOf(header.nps);
  const R = headerOd !== null ? headerOd / 2 : null;
  if (header.nps && compareNps(node.branchNps, header.nps) >= 0) {
    addError(
      ctx.issues,
      'size-mismatch',
      `${nodeRef(node.id)}: NPS ${node.branchNps} on an NPS ${header.nps} header; small-bore connections must be smaller than the header`,
      node.id,
    );
  }

  let axis: Vec3 | null = null;
  let orientationDeg: number | null = null;
  if (branch) {
    if (angleDeg !== null && Math.abs(angleDeg - 90) > tol) {
      addError(
        ctx.issues,
        'angle-not-made',
        `${nodeRef(node.id)}: its branch meets the header at ${round(angleDeg)}°; it is made square (90°) only`,
        node.id,
      );
    }
    axis = branch.outward;
    orientationDeg = orientationOfBranch(h, branch.outward);
    if (node.orientationDeg !== undefined && orientationDeg !== null) {
      const diff = Math.abs(((node.orientationDeg - orientationDeg + 540) % 360) - 180);
      if (diff > tol) {
        addError(
          ctx.issues,
          'direction-mismatch',
          `${nodeRef(node.id)}: stated orientation ${round(node.orientationDeg)}° but its branch run points at ${round(orientationDeg)}°`,
          node.id,
        );
      }
    }
  } else if (node.orientationDeg !== undefined) {
    orientationDeg = ((node.orientationDeg % 360) + 360) % 360;
    axis = branchDirectionFromOrientation(h, orientationDeg);
  } else {
    addError(
      ctx.issues,
      'orientation-missing',
      `${nodeRef(node.id)} has no branch run and no orientationDeg: state where around the header it sits`,
      node.id,
    );
  }

  const spec = ctx.specAt(a.run.id);
  let heightMm: number | null = null;
  let source: string | null = null;
  let brEnd: NodeEnd | null = null;
  if (node.kind === 'half-coupling') {
    const look = socketWeldDimensions(node.branchNps, 'half-coupling');
    if (look.ok) {
      heightMm = look.value.lengthMm ?? null;
      source = look.value.source;
    } else if (branch) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
    else
      addWarning(
        ctx.issues,
        'weight-incomplete',
        `${nodeRef(node.id)}: ${look.missing}; drawn without its length`,
        node.id,
      );
    const f = look.ok ? (look.value.socketBottomToFaceMm ?? null) : null;
    if (look.ok && look.value.status === 'M' && f !== null)
      noteUnconfirmed(
        ctx.unconfirmed,
        'M',
        `NPS ${node.branchNps} half coupling F (socket bottom to the face on the header) = ${mmText(f)} mm`,
        'ASME B16.11',
        node.id,
      );
    if (branch) {
      const gap = ctx.specAt(branch.run.id).socketGapMm;
      // Pipe end: header surface (R) + F up to the socket bottom + the expansion gap.
      const take = f !== null && R !== null ? R + f + gap : null;
      if (look.ok && f === null)
        addError(
          ctx.issues,
          'standard-data-missing',
          `No half-coupling length for NPS ${node.branchNps}`,
          node.id,
        );
      brEnd = socketEnd(branch, ctx.pipe(branch.run.id).nps, take);
    }
  } else {
    heightMm = node.heightMm;
    source = "outlet height as stated (maker's catalogue)";
    if (branch) {
      const p = ctx.pipe(branch.run.id);
      if (node.outletEnd === 'butt') {
        brEnd = buttEnd(
          branch,
          p.nps,
          R !== null ? R + node.heightMm : null,
          ctx.specAt(branch.run.id).rootGapMm,
        );
      } else {
        const sock = socketWeldDimensions(node.branchNps, 'coupling');
        if (!sock.ok) addError(ctx.issues, 'standard-data-missing', sock.missing, node.id);
        const gap = ctx.specAt(branch.run.id).socketGapMm;
        brEnd = socketEnd(
          branch,
          p.nps,
          sock.ok && R !== null ? R + node.heightMm - sock.value.socketDepthMm + gap : null,
        );
      }
    }
  }
  const at = orientationDeg !== null ? ` at ${round(orientationDeg)}°` : '';
  const desc =
    node.kind === 'half-coupling'
      ? `Half coupling Class 3000 SW, NPS ${node.branchNps} on NPS ${header.nps ?? '?'}${at}, ASME B16.11`
      : `Branch outlet NPS ${node.branchNps} ${node.outletEnd === 'butt' ? 'butt-weld' : 'socket-weld'} end, height ${node.heightMm} mm, on NPS ${header.nps ?? '?'}${at}`;
  const bomDesc =
    node.kind === 'half-coupling'
      ? `Half coupling Class 3000 SW, ${spec.flangeMaterial}, ASME B16.11`
      : `Branch outlet ${node.outletEnd === 'butt' ? 'butt-weld' : 'socket-weld'} end on NPS ${header.nps ?? '?'}, height ${node.heightMm} mm, ${spec.flangeMaterial}`;
  const ends = [throughEnd(a, header.nps), throughEnd(b, ctx.pipe(b.run.id).nps)];
  if (brEnd) ends.push(brEnd);
  return {
    node,
    role: ctx.role,
    nps: header.nps,
    ends,
    description: desc,
    bom: {
      category: node.kind === 'half-coupling' ? 'socket-fitting' : 'branch-outlet',
      description: bomDesc,
      nps: node.branchNps,
    },
    source,
    internalWelds: [
      { type: 'branch', nps: node.branchNps, count: 1, joins: `${nodeRef(node.id)} to header` },
    ],
    detail: {
      type: 'branch',
      branchNps: node.branchNps,
      angleDeg: branch ? angleDeg : 90,
      orientationDeg,
      branchAxis: axis,
      headerAxis: h,
      heightMm,
    },
  };
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}
