/**
 * Take-offs of open ends: flanges (ASME B16.5), caps (ASME B16.9 / B16.11), bevelled and
 * plain pipe ends. An end node's work point is its face: the flange's raised face, the
 * cap's tip, or the pipe end itself.
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { capDimensions } from '../standards/butt-weld-fittings';
import { socketWeldDimensions } from '../standards/socket-weld-fittings';
import type { Connection } from './classify-nodes';
import { cachedScheduleLabel, cachedFlangeDimensions } from './standards-cache';
import { addError } from './issues';
import { buttEnd, openEnd, socketEnd } from './node-end-builders';
import { mmText, noteUnconfirmed } from './unconfirmed-data';
import type { FlangeDimensions } from '../standards/flanges';
import type { NodeAnalysis, NodeContext } from './node-analysis';
import { TextMemo } from './text-memo';

type EndNode = Extract<SpoolNode, { kind: 'end' }>;

// Parts: 'weld neck' | 'slip-on', class, NPS (or '?'), schedule label ('' for a slip-on).
const flangeText =
  (blind: boolean) =>
  (kind: string, cls: string, nps: string, sched: string): string =>
    `Flange ${kind} RF Class ${cls}, NPS ${nps}${sched ? ` ${sched} bore` : ''}, ASME B16.5${blind ? ', with blind flange' : ''}`;
const FLANGE_DESCRIPTION = new TextMemo(flangeText(false));
const BLIND_FLANGE_DESCRIPTION = new TextMemo(flangeText(true));
// Parts: kind, class, schedule label ('' for a slip-on), material.
const FLANGE_BOM = new TextMemo(
  (kind, cls, sched, material) =>
    `Flange ${kind} RF Class ${cls}${sched ? ` ${sched} bore` : ''}, ${material}, ASME B16.5`,
);

/** Analyses an end node with its one connection. */
export function analyseEnd(ctx: NodeContext, node: EndNode, conn: Connection): NodeAnalysis {
  const pipe = ctx.pipe(conn.run.id);
  const spec = ctx.specAt(conn.run.id);
  const nps = pipe.nps;
  const sched = cachedScheduleLabel(pipe.schedule);
  const role = ctx.role;
  const end = node.end;

  switch (end.type) {
    case 'weld-neck-flange':
    case 'slip-on-flange': {
      const cls = end.flangeClass ?? spec.flangeClass;
      const wn = end.type === 'weld-neck-flange';
      const look = nps
        ? cachedFlangeDimensions(nps, cls, wn ? 'weld-neck' : 'slip-on', pipe.dims?.wallMm)
        : null;
      if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
      const d = look?.ok ? look.value : null;
      if (d && d.status === 'M')
        noteFlange(ctx, node.id, `NPS ${nps} Class ${cls} ${wn ? 'weld-neck' : 'slip-on'} flange`, d);
      const takeOff = d ? (wn ? d.hubLengthMm + d.raisedFaceMm : (d.slipOnSetbackMm ?? null)) : null;
      if (d && !wn && d.slipOnSetbackMm === undefined) {
        addError(ctx.issues, 'standard-data-missing', `No slip-on setback for NPS ${nps}`, node.id);
      }
      const e = wn ? buttEnd(conn, nps, takeOff, spec.rootGapMm, 'flange') : socketEnd(conn, nps, takeOff);
      if (!wn) {
        e.joint = 'slip-on';
        e.weldType = 'slip-on-fillet';
        e.weldCount = 2;
        if (d && takeOff !== null) e.pipeNeeded = slipOnPipeNeeded(d, takeOff, pipe.dims);
      }
      const kind = wn ? 'weld neck' : 'slip-on';
      const blind = end.blind === true;
      const clsText = String(cls);
      const bore = wn ? sched : '';
      const description = (blind ? BLIND_FLANGE_DESCRIPTION : FLANGE_DESCRIPTION).text(
        kind,
        clsText,
        nps ?? '?',
        bore,
      );
      return {
        node,
        role,
        nps,
        internalWelds: [],
        ends: [e],
        description,
        bom: nps
          ? {
              category: 'flange',
              description: FLANGE_BOM.text(kind, clsText, bore, spec.flangeMaterial),
              nps,
            }
          : null,
        source: d?.source ?? null,
        detail: {
          type: 'flange',
          flangeType: end.type,
          flangeClass: cls,
          blind,
          odMm: d?.odMm ?? null,
          thicknessMm: d?.thicknessMm ?? null,
          hubLengthMm: d?.hubLengthMm ?? null,
          raisedFaceMm: d?.raisedFaceMm ?? null,
          raisedFaceDiaMm: d?.raisedFaceDiaMm ?? null,
          hubDiaAtBaseMm: d?.hubDiaAtBaseMm ?? null,
          boltCircleMm: d?.boltCircleMm ?? null,
          boltCount: d?.boltCount ?? null,
          boltHoleDiaMm: d?.boltHoleDiaMm ?? null,
        },
      };
    }
    case 'cap': {
      const look = nps && pipe.dims ? capDimensions(nps, pipe.dims.wallMm) : null;
      if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
      const len = look?.ok ? look.value.lengthMm : null;
      if (look?.ok && look.value.status === 'M')
        noteUnconfirmed(
          ctx.unconfirmed,
          'M',
          `NPS ${nps} cap limiting wall = ${mmText(look.value.limitingWallMm)} mm (it picks the cap length ${mmText(look.value.lengthMm)} mm for this ${mmText(pipe.dims!.wallMm)} mm wall)`,
          'ASME B16.9',
          node.id,
        );
      return {
        node,
        role,
        nps,
        internalWelds: [],
        ends: [buttEnd(conn, nps, len, spec.rootGapMm)],
        description: `Cap, NPS ${nps ?? '?'} ${sched}, ASME B16.9`,
        bom: nps
          ? { category: 'fitting', description: `Cap ${sched}, ${spec.fittingMaterial}, ASME B16.9`, nps }
          : null,
        source: look?.ok ? look.value.source : null,
        detail: { type: 'cap', lengthMm: len, socket: false },
      };
    }
    case 'socket-cap': {
      const look = nps ? socketWeldDimensions(nps, 'cap') : null;
      if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
      const d = look?.ok ? look.value : null;
      // Work point at the cap's tip: the pipe end sits (length − socket depth) + gap from it.
      const len = d?.lengthMm ?? null;
      const takeOff = d && len !== null ? len - d.socketDepthMm + spec.socketGapMm : null;
      if (d && len === null)
        addError(ctx.issues, 'standard-data-missing', `No socket-weld cap length for NPS ${nps}`, node.id);
      return {
        node,
        role,
        nps,
        internalWelds: [],
        ends: [socketEnd(conn, nps, takeOff)],
        description: `Socket-weld cap Class 3000, NPS ${nps ?? '?'}, ASME B16.11`,
        bom: nps
          ? {
              category: 'socket-fitting',
              description: `Socket-weld cap Class 3000, ${spec.flangeMaterial}, ASME B16.11`,
              nps,
            }
          : null,
        source: d?.source ?? null,
        detail: { type: 'cap', lengthMm: len, socket: true },
      };
    }
    case 'bevel': {
      const fieldWeld = end.fieldWeld ?? true;
      const allowance = end.fieldFitAllowanceMm ?? 0;
      return {
        node,
        role,
        nps,
        internalWelds: [],
        ends: [openEnd(conn, nps, 'weld-bevel')],
        description: `Open end, bevelled${fieldWeld ? ' for field weld' : ''}${allowance > 0 ? `, ${allowance} mm field-fit allowance` : ''}`,
        bom: null,
        source: null,
        detail: { type: 'open-end', endType: 'bevel', fieldWeld, fieldFitAllowanceMm: allowance },
      };
    }
    case 'plain':
      return {
        node,
        role,
        nps,
        internalWelds: [],
        ends: [openEnd(conn, nps, 'square')],
        description: 'Open end, square cut',
        bom: null,
        source: null,
        detail: { type: 'open-end', endType: 'plain', fieldWeld: false, fieldFitAllowanceMm: 0 },
      };
  }
}

/** Notes each group of a flange's values that is from memory (drilling, hub length, body). */
function noteFlange(ctx: NodeContext, nodeId: string, what: string, d: FlangeDimensions): void {
  const p = d.partStatus;
  const note = (values: string) =>
    noteUnconfirmed(ctx.unconfirmed, 'M', `${what} ${values}`, 'ASME B16.5', nodeId);
  if (p.drilling === 'M')
    note(
      `drilling (OD ${mmText(d.odMm)} mm, bolt circle ${mmText(d.boltCircleMm)} mm, ${d.boltCount} holes ${d.boltHoleDiaIn} in)`,
    );
  if (p.hubLength === 'M') note(`length through hub Y = ${mmText(d.hubLengthMm)} mm`);
  if (p.body === 'M') note(`thickness tf = ${mmText(d.thicknessMm)} mm`);
}

/**
 * Pipe a slip-on flange needs from the pipe end: through the rest of the hub (Y + raised
 * face − setback) and out past its back by the hub fillet's leg. ASME B31.3 Fig. 328.5.2B
 * (slip-on flange welds): leg x ≥ the lesser of 1.4 T and the hub thickness (from memory;
 * the hub thickness is taken at its base, (X − pipe OD) / 2). Without it the pipe ends
 * inside the hub and neither the hub fillet nor the weld at the pipe's other end can be made.
 */
export function slipOnPipeNeeded(
  d: FlangeDimensions,
  setbackMm: number,
  pipe: { odMm: number; wallMm: number } | null,
): { mm: number; insideMm: number; why: string } | null {
  if (!pipe) return null;
  const inHub = d.hubLengthMm + d.raisedFaceMm - setbackMm;
  const hubWall = d.hubDiaAtBaseMm !== undefined ? (d.hubDiaAtBaseMm - pipe.odMm) / 2 : Infinity;
  const leg = Math.min(1.4 * pipe.wallMm, hubWall);
  if (!(inHub > 0) || !(leg > 0)) return null;
  return {
    mm: inHub + leg,
    insideMm: inHub,
    why: `${mmText(inHub)} mm through the slip-on's hub and ${mmText(leg)} mm for the hub fillet, 1.4 × wall per ASME B31.3 Fig. 328.5.2B`,
  };
}
