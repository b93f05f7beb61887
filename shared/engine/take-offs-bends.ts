/**
 * Take-offs of bends: butt-weld elbows (ASME B16.9 90° and 45°, any other angle up to 90°
 * cut from a 90° with take-off R·tan(θ/2)), mitred bends, and 180° returns.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef } from './component-refs';
import { npsInches } from '../standards/nps';
import type { Connection } from './classify-nodes';
import { cachedElbowDimensions, cachedScheduleLabel } from './standards-cache';
import { addError, addWarning } from './issues';
import { buttEnd } from './node-end-builders';
import { mmText, noteUnconfirmed } from './unconfirmed-data';
import type { NodeAnalysis, NodeContext } from './node-analysis';
import { cross, normalise, rejectFrom, scale } from './vec3-math';
import { TextMemo } from './text-memo';
import { checkMitre } from './mitre-rules';
import { standardAngleFor, warnPulled } from './fitting-angle';
import { componentWords } from './shop-words';

type ElbowNode = Extract<SpoolNode, { kind: 'elbow' }>;
type ReturnNode = Extract<SpoolNode, { kind: 'return' }>;

const DEG = Math.PI / 180;

const ELBOW_DESCRIPTION = new TextMemo((what, nps, sched) => `${what}, NPS ${nps} ${sched}, ASME B16.9`);
const ELBOW_BOM = new TextMemo((what, sched, material) => `${what} ${sched}, ${material}, ASME B16.9`);
const ELBOW_90 = { LR: 'Elbow 90° LR', SR: 'Elbow 90° SR' } as const;
const ELBOW_45 = { LR: 'Elbow 45° LR', SR: 'Elbow 45° SR' } as const;

/** Largest deflection one elbow or mitred bend makes, degrees. */
export const MAX_BEND_DEG = 90;

/** Centre-to-end of an elbow of radius R (mm) cut to θ degrees: R·tan(θ/2), mm. */
export function cutElbowTakeOffMm(bendRadiusMm: number, angleDeg: number): number {
  return bendRadiusMm * Math.tan((angleDeg * DEG) / 2);
}

/** Analyses an elbow between legs `a` and `b` meeting at `angleDeg` of deflection. */
export function analyseElbow(
  ctx: NodeContext,
  node: ElbowNode,
  a: Connection,
  b: Connection,
  angleDeg: number,
): NodeAnalysis {
  const pipe = ctx.pipe(a.run.id);
  const nps = pipe.nps;
  const radius = node.radius ?? 'long';
  const rr = radius === 'long' ? 'LR' : 'SR';
  const mitre = node.construction === 'mitre';
  const tol = ctx.angleToleranceDeg;
  const gA = ctx.specAt(a.run.id).rootGapMm;
  const gB = ctx.specAt(b.run.id).rootGapMm;
  const sched = cachedScheduleLabel(pipe.schedule);
  const spec = ctx.specAt(a.run.id);
  const fail = (msg: string): NodeAnalysis => {
    addError(ctx.issues, 'angle-not-made', msg, node.id);
    return {
      node,
      role: ctx.role,
      nps,
      ends: [buttEnd(a, nps, null, gA), buttEnd(b, nps, null, gB)],
      description: `Elbow ${rr}, NPS ${nps ?? '?'}`,
      bom: null,
      source: null,
      internalWelds: [],
      detail: {
        type: 'elbow',
        angleDeg,
        bendRadiusMm: null,
        construction: mitre ? 'mitre' : 'fitting',
        mitreWelds: null,
        mitreSegmentMm: null,
      },
    };
  };
  // Fittings are pulled up to the shop's tolerance at the welds; mitres are cut to the angle.
  const pullTol = mitre ? tol : Math.max(tol, spec.fittingAngleToleranceDeg);
  const words = componentWords(
    mitre ? `Mitred bend, NPS ${nps ?? '?'}` : `Elbow ${rr}, NPS ${nps ?? '?'}`,
    node,
  );
  if (angleDeg < tol)
    return fail(
      `${nodeRef(node.id)}: its runs are in a straight line (${round(angleDeg)}° of bend); remove the elbow or turn a run`,
    );
  if (angleDeg > MAX_BEND_DEG + pullTol) {
    return fail(
      `${nodeRef(node.id)}: a ${round(angleDeg)}° bend is more than one elbow makes (90° at most); use two elbows or a return`,
    );
  }
  if (!nps) return fail(`${nodeRef(node.id)}: size unknown`);
  if (angleDeg < spec.minBendAngleDeg) {
    // Common practice, no source: a bend this small is taken up at a butt weld.
    addWarning(
      ctx.issues,
      'bend-too-small',
      `${words}: a ${round(angleDeg)}° bend is below the shop's ${round(spec.minBendAngleDeg)}° minimum; a sliver of elbow this thin is hard to fit: consider a straight butt joint with the ${round(angleDeg)}° taken up at the weld`,
      node.id,
    );
  }

  const standard = mitre ? null : standardAngleFor(angleDeg, radius === 'long' ? [90, 45] : [90], pullTol);
  if (standard) warnPulled(ctx.issues, words, node.id, angleDeg, standard, tol);
  const is90 = standard?.angleDeg === 90;
  const is45 = standard?.angleDeg === 45;
  const base90 = cachedElbowDimensions(nps, radius === 'long' ? 'LR90' : 'SR90');
  // Messages are built only for from-memory values: this runs on every keystroke.
  const note90 = (what: string) => {
    if (base90.ok && base90.value.status === 'M')
      noteUnconfirmed(
        ctx.unconfirmed,
        'M',
        `NPS ${nps} ${radius === 'long' ? 'long' : 'short'}-radius 90° elbow ${what} = ${mmText(base90.value.centreToEndMm)} mm`,
        'ASME B16.9',
        node.id,
      );
  };

  if (mitre) {
    const welds = node.mitreWelds ?? 2;
    // Mitres are laid out on the radius of the matching elbow, else the nominal 1.5D / 1D.
    const R = base90.ok ? base90.value.bendRadiusMm : npsInches(nps) * 25.4 * (radius === 'long' ? 1.5 : 1);
    const per = angleDeg / welds;
    const tHalf = R * Math.tan((per * DEG) / 2);
    const takeOff = cutElbowTakeOffMm(R, angleDeg) - tHalf;
    const g = spec.rootGapMm;
    const segment = welds > 1 ? 2 * tHalf - g : null;
    note90('radius (A)');
    checkMitre(
      {
        words,
        nodeId: node.id,
        welds,
        cutDeg: per / 2,
        radiusMm: R,
        segmentMm: segment,
        minPieceMm: spec.minPieceLengthMm,
        wallMm: pipe.dims?.wallMm ?? null,
        odMm: pipe.dims?.odMm ?? null,
      },
      ctx.issues,
    );
    if (segment !== null && segment <= 0) {
      addError(
        ctx.issues,
        'overlapping-fittings',
        `${nodeRef(node.id)}: ${welds} welds on radius ${round(R)} mm leave no room for the segments`,
        node.id,
      );
    }
    const end = (c: Connection, gap: number) => ({
      ...buttEnd(c, nps, takeOff, gap / 2),
      prep: 'mitre' as const,
      mitreCutDeg: per / 2,
    });
    return {
      node,
      role: ctx.role,
      nps,
      // A single mitre is one weld, listed once (at the first leg).
      ends: [end(a, g), welds === 1 ? { ...end(b, g), weldType: null, weldCount: 0 } : end(b, g)],
      description: `Mitred bend ${round(angleDeg)}°, ${welds + 1} pieces, R ${round(R)} mm, NPS ${nps} ${sched}`,
      bom: null,
      source: base90.ok
        ? `radius from ${base90.value.source}`
        : 'radius 1.5 × NPS (long) / 1.0 × NPS (short), nominal',
      internalWelds:
        welds > 1
          ? [
              {
                type: 'butt',
                nps,
                count: welds - 2 >= 0 ? welds - 2 : 0,
                joins: `mitre segments of ${nodeRef(node.id)}`,
              },
            ]
          : [],
      detail: {
        type: 'elbow',
        angleDeg,
        bendRadiusMm: R,
        construction: 'mitre',
        mitreWelds: welds,
        mitreSegmentMm: segment !== null && segment > 0 ? segment : null,
      },
    };
  }

  let takeOff: number | null = null;
  let source: string | null = null;
  let R: number | null = base90.ok ? base90.value.bendRadiusMm : null;
  let what: string;
  if (is90) {
    if (!base90.ok) addError(ctx.issues, 'standard-data-missing', base90.missing, node.id);
    else ({ centreToEndMm: takeOff, source } = base90.value);
    note90('A');
    what = ELBOW_90[rr];
  } else if (is45 && radius === 'long') {
    const e45 = cachedElbowDimensions(nps, 'LR45');
    if (!e45.ok) addError(ctx.issues, 'standard-data-missing', e45.missing, node.id);
    else {
      ({ centreToEndMm: takeOff, source } = e45.value);
      R = e45.value.bendRadiusMm;
      if (e45.value.status === 'M')
        noteUnconfirmed(
          ctx.unconfirmed,
          e45.value.status,
          `NPS ${nps} long-radius 45° elbow B = ${mmText(e45.value.centreToEndMm)} mm`,
          'ASME B16.9',
          node.id,
        );
    }
    what = ELBOW_45[rr];
  } else {
    if (!base90.ok) addError(ctx.issues, 'standard-data-missing', base90.missing, node.id);
    else {
      takeOff = cutElbowTakeOffMm(base90.value.bendRadiusMm, angleDeg);
      source = `${base90.value.source}; cut to ${round(angleDeg)}°, take-off R·tan(θ/2)`;
      note90('radius (A)');
    }
    what = `Elbow ${rr} cut to ${round(angleDeg)}° (from 90°)`;
    addWarning(
      ctx.issues,
      'cut-elbow',
      `${nodeRef(node.id)} is cut from a 90° ${rr} elbow to ${round(angleDeg)}°: mark and trim it before fit-up`,
      node.id,
    );
  }
  return {
    node,
    role: ctx.role,
    nps,
    ends: [buttEnd(a, nps, takeOff, gA), buttEnd(b, nps, takeOff, gB)],
    description: ELBOW_DESCRIPTION.text(what, nps, sched),
    bom: { category: 'fitting', description: ELBOW_BOM.text(what, sched, spec.fittingMaterial), nps },
    source,
    internalWelds: [],
    detail: {
      type: 'elbow',
      angleDeg,
      bendRadiusMm: R,
      construction: 'fitting',
      mitreWelds: null,
      mitreSegmentMm: null,
    },
  };
}

/**
 * Analyses a 180° return. `a` is the incoming leg. Both faces lie in the plane through the
 * centre of the bend, so take-off 0 from the ports, which sit ±O/2 along the offset.
 */
export function analyseReturn(
  ctx: NodeContext,
  node: ReturnNode,
  a: Connection,
  b: Connection,
): NodeAnalysis {
  const pipe = ctx.pipe(a.run.id);
  const nps = pipe.nps;
  const radius = node.radius ?? 'long';
  const rr = radius === 'long' ? 'LR' : 'SR';
  const spec = ctx.specAt(a.run.id);
  const sched = cachedScheduleLabel(pipe.schedule);
  const u = normalise(rejectFrom(node.offsetDirection, a.outward));
  if (!u) {
    addError(
      ctx.issues,
      'direction-mismatch',
      `${nodeRef(node.id)}: its offset direction must not be along the legs`,
      node.id,
    );
  }
  const look = nps ? cachedElbowDimensions(nps, radius === 'long' ? 'LR180' : 'SR180') : null;
  if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
  const O = look?.ok ? look.value.centreToEndMm : null;
  if (look?.ok && look.value.status === 'M')
    noteUnconfirmed(
      ctx.unconfirmed,
      'M',
      `NPS ${nps} ${radius === 'long' ? 'long' : 'short'}-radius 180° return O = ${mmText(look.value.centreToEndMm)} mm, K = ${mmText(look.value.backToFaceMm ?? 0)} mm`,
      'ASME B16.9',
      node.id,
    );
  const half = O !== null && u ? scale(u, O / 2) : { x: 0, y: 0, z: 0 };
  const takeOff = O !== null && u ? 0 : null;
  const endA = buttEnd(a, nps, takeOff, ctx.specAt(a.run.id).rootGapMm);
  endA.portOffset = scale(half, -1);
  const endB = buttEnd(b, nps, takeOff, ctx.specAt(b.run.id).rootGapMm);
  endB.portOffset = half;
  return {
    node,
    role: ctx.role,
    nps,
    ends: [endA, endB],
    description: `Return 180° ${rr}, NPS ${nps ?? '?'} ${sched}, ASME B16.9`,
    bom: nps
      ? {
          category: 'fitting',
          description: `Return 180° ${rr} ${sched}, ${spec.fittingMaterial}, ASME B16.9`,
          nps,
        }
      : null,
    source: look?.ok ? look.value.source : null,
    internalWelds: [],
    detail: {
      type: 'return',
      bendRadiusMm: O !== null ? O / 2 : null,
      centreToCentreMm: O,
      offset: u ?? normalise(cross(a.outward, { x: 0, y: 0, z: 1 })) ?? { x: 1, y: 0, z: 0 },
    },
  };
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}
