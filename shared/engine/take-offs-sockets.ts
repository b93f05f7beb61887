/**
 * Take-offs of socket-weld fittings (ASME B16.11 Class 3000): the pipe end sits one
 * expansion gap short of the socket bottom, so take-off = centre-to-bottom A + gap, and
 * the cut length between two sockets is C–C − (A₁ + g) − (A₂ + g).
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef, runRef } from './component-refs';
import { socketWeldDimensions, type SocketFittingKind } from '../standards/socket-weld-fittings';
import type { Connection, NodeRole } from './classify-nodes';
import { addError } from './issues';
import { socketEnd } from './node-end-builders';
import { standardAngleFor, warnPulled } from './fitting-angle';
import { componentWords } from './shop-words';
import type { NodeAnalysis, NodeContext } from './node-analysis';

type SocketNode = Extract<SpoolNode, { kind: 'socket-fitting' }>;

const NAMES: Record<'elbow90' | 'elbow45' | 'tee' | 'coupling', string> = {
  elbow90: 'Socket-weld elbow 90°',
  elbow45: 'Socket-weld elbow 45°',
  tee: 'Socket-weld tee',
  coupling: 'Socket-weld coupling',
};

/** Analyses a socket-weld fitting from its role (bend 90/45, inline coupling, tee). */
export function analyseSocketFitting(ctx: NodeContext, node: SocketNode, role: NodeRole): NodeAnalysis {
  const conns: Connection[] =
    role.kind === 'bend' || role.kind === 'inline'
      ? [role.a, role.b]
      : role.kind === 'tee'
        ? [role.runA, role.runB, role.branch]
        : [];
  const tol = ctx.angleToleranceDeg;
  let fitting: 'elbow90' | 'elbow45' | 'tee' | 'coupling' | null = null;
  if (role.kind === 'inline') fitting = 'coupling';
  else if (role.kind === 'tee') fitting = 'tee';
  else if (role.kind === 'bend') {
    const pullTol = Math.max(tol, ctx.specAt(role.a.run.id).fittingAngleToleranceDeg);
    const standard = standardAngleFor(role.angleDeg, [90, 45], pullTol);
    if (standard) {
      fitting = standard.angleDeg === 90 ? 'elbow90' : 'elbow45';
      warnPulled(
        ctx.issues,
        componentWords(`${NAMES[fitting]}, NPS ${ctx.pipe(role.a.run.id).nps ?? '?'}`, node),
        node.id,
        role.angleDeg,
        standard,
        tol,
      );
    } else {
      addError(
        ctx.issues,
        'angle-not-made',
        `${nodeRef(node.id)}: its runs turn ${Math.round(role.angleDeg * 100) / 100}°; socket-weld elbows are 90° or 45° only`,
        node.id,
      );
    }
  }
  const first = conns[0] ? ctx.pipe(conns[0].run.id) : null;
  const nps = first?.nps ?? null;
  for (const c of conns) {
    const p = ctx.pipe(c.run.id);
    if (nps && p.nps && p.nps !== nps) {
      addError(
        ctx.issues,
        'size-mismatch',
        `${nodeRef(node.id)}: ${runRef(c.run.id)} is NPS ${p.nps}, the fitting is NPS ${nps}`,
        node.id,
      );
    }
  }
  const look = nps && fitting ? socketWeldDimensions(nps, fitting as SocketFittingKind) : null;
  if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
  const A = look?.ok ? look.value.centreToBottomMm : null;
  const spec = ctx.specAt(conns[0]?.run.id ?? null);
  const ends = conns.map((c) =>
    socketEnd(c, ctx.pipe(c.run.id).nps, A !== null ? A + ctx.specAt(c.run.id).socketGapMm : null),
  );
  const name = fitting ? NAMES[fitting] : 'Socket-weld fitting';
  return {
    node,
    role,
    nps,
    ends,
    description: `${name} Class 3000, NPS ${nps ?? '?'}, ASME B16.11`,
    bom:
      nps && fitting
        ? {
            category: 'socket-fitting',
            description: `${name} Class 3000, ${spec.flangeMaterial}, ASME B16.11`,
            nps,
          }
        : null,
    source: look?.ok ? look.value.source : null,
    internalWelds: [],
    detail: { type: 'socket-fitting', fitting },
  };
}
