import type {
  FlangeOrientation,
  FlangePairCheck,
  SpoolResult,
} from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import type { FlowBlock, Placement } from './flow-layout';
import type { Rect } from './page-setup';
import { mm } from './page-setup';
import { INK } from './sheet-style';
import { tableBlock } from './table-block';
import { drawText } from './text';

/** Names a plant direction the way the bay says it: "east", "up", "north-east and down". */
export function describeDirection(v: Vec3): string {
  const parts: string[] = [];
  const t = 0.2;
  if (v.y > t) parts.push('north');
  if (v.y < -t) parts.push('south');
  if (v.x > t) parts.push('east');
  if (v.x < -t) parts.push('west');
  const horizontal = parts.join('-');
  const vertical = v.z > t ? 'up' : v.z < -t ? 'down' : '';
  return [horizontal, vertical].filter(Boolean).join(' and ') || 'unknown';
}

const fmtDeg = (deg: number) => `${Number(deg.toFixed(1))}°`;

/** Bolt-hole views of every flange, in a grid that wraps and continues across columns. */
export function flangeDetailsBlock(
  flanges: FlangeOrientation[],
  tags: Map<string, string>,
  units: LengthUnits,
  size: number,
  /** Per flange node: extra words for the cell (its design label, a revision mark). */
  extras: Map<string, string> = new Map(),
  start = 0,
): FlowBlock {
  return {
    place(doc: PDFKit.PDFDocument, area: Rect, fresh: boolean): Placement {
      const titleH = size * 1.25 + 3;
      const cellW = Math.max(mm(46), Math.min(mm(60), area.w / Math.max(1, Math.floor(area.w / mm(50)))));
      const perRow = Math.max(1, Math.floor(area.w / cellW));
      const cellH = cellW * 0.62 + size * 10.6;
      const rowsFit = Math.floor((area.h - titleH) / cellH);
      if (rowsFit < 1 && !fresh) return { used: 0, rest: this };
      const count = Math.min(flanges.length - start, Math.max(1, rowsFit) * perRow);
      const title =
        start > 0
          ? 'FLANGE BOLT HOLES (CONTINUED)'
          : 'FLANGE BOLT HOLES — SEEN FACING THE FACE, ANGLES CLOCKWISE (CW)';
      drawText(doc, title, area.x, area.y, {
        font: 'cond-bold',
        size: size * 1.2,
        color: INK.black,
        width: area.w,
      });
      for (let k = 0; k < count; k += 1) {
        const f = flanges[start + k]!;
        const col = k % perRow;
        const row = Math.floor(k / perRow);
        drawFlangeCell(
          doc,
          { x: area.x + col * cellW, y: area.y + titleH + row * cellH, w: cellW - 4, h: cellH - 4 },
          f,
          tags.get(f.nodeId) ?? f.nodeId,
          units,
          size,
          extras.get(f.nodeId) ?? '',
          f.bendPlaneNodeId ? (tags.get(f.bendPlaneNodeId) ?? '') : '',
        );
      }
      const rowsUsed = Math.ceil(count / perRow);
      const next = start + count;
      return {
        used: titleH + rowsUsed * cellH,
        rest: next < flanges.length ? flangeDetailsBlock(flanges, tags, units, size, extras, next) : null,
      };
    },
  };
}

function drawFlangeCell(
  doc: PDFKit.PDFDocument,
  cell: Rect,
  f: FlangeOrientation,
  tag: string,
  units: LengthUnits,
  size: number,
  extra: string,
  /** Shop mark of the bend whose plane the second angle is measured from. */
  bendMark: string,
): void {
  const bad = f.mustTwoHole && !f.straddles;
  doc.save();
  doc
    .lineWidth(bad ? 1.4 : 0.6)
    .strokeColor(bad ? INK.warn : INK.rule)
    .rect(cell.x, cell.y, cell.w, cell.h)
    .stroke();
  const pad = 3;
  const kind = f.type === 'weld-neck-flange' ? 'WN' : 'SO';
  drawText(doc, `${tag}  NPS ${f.nps} Cl ${f.flangeClass} ${kind}`, cell.x + pad, cell.y + pad, {
    font: 'cond-bold',
    size: size * 1.05,
    width: cell.w - 2 * pad,
  });
  drawText(doc, `Face looks ${describeDirection(f.outward)}`, cell.x + pad, cell.y + pad + size * 1.3, {
    size: size * 0.85,
    color: INK.muted,
    width: cell.w - 2 * pad,
  });

  if (extra) {
    drawText(doc, extra, cell.x + pad, cell.y + pad + size * 2.3, {
      size: size * 0.85,
      color: INK.muted,
      width: cell.w - 2 * pad,
    });
  }
  // The view: reference up, holes clockwise as seen facing the face.
  const r = cell.w * 0.27;
  const cx = cell.x + cell.w / 2;
  const cy = cell.y + pad + size * 3.7 + r + size + 8;
  const ref = f.reference === 'plant-vertical' ? 'UP' : 'N';
  doc.lineWidth(0.5).strokeColor(INK.muted).dash(3, { space: 2 });
  doc
    .moveTo(cx - r - 6, cy)
    .lineTo(cx + r + 6, cy)
    .moveTo(cx, cy - r - 6)
    .lineTo(cx, cy + r + 6)
    .stroke();
  doc.undash();
  doc.lineWidth(1).strokeColor(INK.black).circle(cx, cy, r).stroke();
  doc
    .lineWidth(0.4)
    .strokeColor(INK.muted)
    .circle(cx, cy, r * 0.78)
    .stroke();
  doc
    .lineWidth(0.8)
    .strokeColor(INK.black)
    .circle(cx, cy, r * 0.42)
    .stroke();
  drawText(doc, ref, cx - 10, cy - r - 8 - size, { font: 'cond-bold', size, width: 20, align: 'center' });
  const n = f.boltCount ?? 0;
  const holeR = Math.max(1.6, Math.min(3.5, (Math.PI * r * 0.78) / Math.max(n, 4) / 3));
  for (let i = 0; i < n; i += 1) {
    const a = ((f.rotationDeg + (i * 360) / n) * Math.PI) / 180;
    const hx = cx + r * 0.78 * Math.sin(a);
    const hy = cy - r * 0.78 * Math.cos(a);
    if (i === 0) {
      doc.circle(hx, hy, holeR + 0.6).fill(bad ? INK.warn : INK.black);
      doc.lineWidth(0.5).strokeColor(INK.black).moveTo(cx, cy).lineTo(hx, hy).stroke();
    } else {
      doc.lineWidth(0.8).strokeColor(INK.black).circle(hx, hy, holeR).stroke();
    }
  }
  // Clockwise arc from the reference to hole 1, to show which way the angle runs.
  if (f.rotationDeg > 0.05) {
    const ar = r * 0.55;
    const end = (f.rotationDeg * Math.PI) / 180;
    doc.lineWidth(0.7).strokeColor(INK.dim);
    doc.moveTo(cx, cy - ar);
    const steps = 16;
    for (let s = 1; s <= steps; s += 1) {
      const t = (end * s) / steps;
      doc.lineTo(cx + ar * Math.sin(t), cy - ar * Math.cos(t));
    }
    doc.stroke();
  }

  let ty = cy + r + 8;
  const line = (text: string, opts: { bold?: boolean; warn?: boolean } = {}) => {
    drawText(doc, text, cell.x + pad, ty, {
      font: opts.bold ? 'body-bold' : 'body',
      size: size * 0.9,
      color: opts.warn ? INK.warn : INK.text,
      width: cell.w - 2 * pad,
    });
    ty += size * 1.15;
  };
  line(`${n || '?'} holes, BC ${f.boltCircleMm === null ? '?' : formatLength(f.boltCircleMm, units)}`);
  line(`Hole 1: ${fmtDeg(f.rotationDeg)} CW from ${ref}`, { bold: true });
  if (f.straddles) line('Straddles centrelines (two-holed)');
  else
    line(f.mustTwoHole ? 'ON CENTRELINE: must two-hole' : 'On centrelines, as designed', {
      warn: f.mustTwoHole,
      bold: f.mustTwoHole,
    });
  if (f.correction) {
    const c = f.correction;
    line(
      `Turn ${fmtDeg(Math.abs(c.rotateClockwiseLookingAtFaceDeg))} ${c.rotateClockwiseLookingAtFaceDeg >= 0 ? 'CW' : 'CCW'} facing${c.atBoltCircleMm === null ? '' : ` = ${formatLength(c.atBoltCircleMm, units)} at BC`}`,
      { bold: true, warn: true },
    );
  }
  if (f.bendPlaneRotationDeg !== null)
    line(`${fmtDeg(f.bendPlaneRotationDeg)} from bend plane ${bendMark}`.trim());
  doc.restore();
}

/** Flange-to-flange bolt-hole checks (holes of one carried through the spool to the other). */
export function flangePairsBlock(
  result: SpoolResult,
  tags: Map<string, string>,
  units: LengthUnits,
  size: number,
): FlowBlock | null {
  if (result.flangePairs.length === 0) return null;
  const name = (id: string) => tags.get(id) ?? id;
  return tableBlock({
    title: 'Flange-to-flange hole alignment',
    size,
    columns: [
      { header: 'Flanges', weight: 1.1 },
      { header: 'Error', weight: 0.9, align: 'right' },
      { header: 'At bolt circle', weight: 1.1, align: 'right' },
      { header: 'Tolerance', weight: 1, align: 'right' },
      { header: 'Result / correction', weight: 2.6 },
    ],
    rows: result.flangePairs.map((p: FlangePairCheck) => {
      const ok = p.withinTolerance;
      const fix = p.correction
        ? `turn ${name(p.correction.flangeId)} ${fmtDeg(Math.abs(p.correction.rotateClockwiseLookingAtFaceDeg))} ${p.correction.rotateClockwiseLookingAtFaceDeg >= 0 ? 'clockwise' : 'counter-clockwise'} looking at its face${p.correction.atBoltCircleMm === null ? '' : ` (${formatLength(p.correction.atBoltCircleMm, units)})`}`
        : '';
      return {
        cells: [
          `${name(p.a)} to ${name(p.b)}`,
          p.errorDeg === null ? '—' : fmtDeg(p.errorDeg),
          p.errorMm === null ? '—' : formatLength(p.errorMm, units),
          formatLength(p.toleranceMm, units),
          ok === null
            ? p.parallelFaces
              ? 'not checked'
              : 'faces not parallel: check by bend plane'
            : ok
              ? 'OK'
              : `OUT: ${fix}`,
        ],
        emphasis: ok === false ? 'warn' : undefined,
      };
    }),
  });
}
