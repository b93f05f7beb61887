import { shopMarks } from './shop-marks';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { mitreTemplate } from '../../../../shared/templates/mitre-template';
import { setOnBranchTemplate } from '../../../../shared/templates/saddle-template';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';

/** A 2D point on a template, mm: x across (round the pipe), y down from the datum line. */
export interface TemplatePoint {
  x: number;
  y: number;
}

/** A station line printed on a template, with its ordinate. */
export interface TemplateStation {
  label: string;
  x: number;
  /** Where the ordinate ends (the cut line), mm below the datum. */
  y: number;
  /** Value printed, mm (formatted in the job's units by the page). */
  ordinateMm: number;
}

/**
 * A full-size cut template, laid out in millimetres before it is printed at 1:1.
 * The datum line is y = 0 (a square line round the pipe); the cut outline is `outline`.
 */
export interface TemplateFigure {
  kind: 'branch-saddle' | 'header-hole' | 'mitre';
  title: string;
  /** Component the template belongs to. */
  nodeId: string;
  widthMm: number;
  heightMm: number;
  /** Offset of the drawing's own origin inside the figure box, mm. */
  originMm: TemplatePoint;
  outline: TemplatePoint[];
  closed: boolean;
  stations: TemplateStation[];
  /** Straight reference lines (datum, crest, centreline), each with a label. */
  guides: { from: TemplatePoint; to: TemplatePoint; label: string }[];
  /** Where the wrap ends and the glue tab starts (wrap templates), mm in figure space. */
  wrapEndMm: number | null;
  instructions: string[];
  facts: string[];
}

const TAB_MM = 20; // overlap tab past the wrap length, to tape the template to itself
const MARGIN_MM = 12;

function stationCount(odMm: number): number {
  return odMm < 200 ? 16 : 32;
}

/** Every template a spool needs: saddle and header hole per set-on branch, one per mitred bend. */
export function templateFigures(
  result: SpoolResult,
  units: LengthUnits,
): { figures: TemplateFigure[]; problems: string[] } {
  const L = (value: number) => formatLength(value, units);
  const marks = shopMarks(result);
  const figures: TemplateFigure[] = [];
  const problems: string[] = [];
  for (const c of result.components) {
    const shape = c.shape;
    if (shape.type === 'set-on-branch') {
      const header = c.ends.find(
        (e) => e.runId !== null && Math.abs(Math.abs(dot(e.outward, shape.headerAxis)) - 1) < 1e-3,
      );
      const branch =
        c.ends.find((e) => Math.abs(dot(e.outward, shape.branchAxis) - 1) < 1e-3) ??
        c.ends[c.ends.length - 1];
      const branchPiece = result.pieces.find((p) => branch?.runId && p.runIds.includes(branch.runId));
      const headerOd = header?.odMm ?? null;
      const branchOd = branch?.odMm ?? null;
      if (headerOd === null || branchOd === null) {
        problems.push(`No template for set-on branch ${marks.get(c.nodeId) ?? '?'}: pipe OD unknown.`);
        continue;
      }
      const calc = setOnBranchTemplate({
        headerOdMm: headerOd,
        branchOdMm: branchOd,
        stations: stationCount(branchOd),
        branchAngleDeg: shape.angleDeg > 90 ? 180 - shape.angleDeg : shape.angleDeg,
        wallMm: branchPiece?.wallMm ?? undefined,
      });
      if (!calc.ok) {
        problems.push(`No template for set-on branch ${marks.get(c.nodeId) ?? '?'}: ${calc.message}`);
        continue;
      }
      const t = calc.value;
      // A fine outline (1° steps) so the printed cut line is the true curve between labelled stations.
      const fine = setOnBranchTemplate({
        headerOdMm: headerOd,
        branchOdMm: branchOd,
        stations: 360,
        branchAngleDeg: shape.angleDeg > 90 ? 180 - shape.angleDeg : shape.angleDeg,
        wallMm: branchPiece?.wallMm ?? undefined,
      });
      const fineStations = fine.ok ? fine.value.stations : t.stations;
      const label = `NPS ${shape.branchNps} on NPS ${header?.nps ?? c.nps ?? '?'}`;
      // Branch saddle: wrap round the branch, datum square line at the top, cut line below.
      const wrap = t.branchCircumferenceMm;
      const stations = t.stations.map((s) => ({
        x: s.branchWrapMm,
        y: s.branchCutBackMm,
        label: `${s.index}`,
        ordinateMm: s.branchCutBackMm,
      }));
      const outline = [
        ...fineStations.map((s) => ({ x: s.branchWrapMm, y: s.branchCutBackMm })),
        { x: wrap, y: t.stations[0]!.branchCutBackMm },
      ];
      figures.push({
        kind: 'branch-saddle',
        title: `Branch saddle ${marks.get(c.nodeId) ?? '?'} · ${label}`,
        nodeId: c.nodeId,
        widthMm: wrap + TAB_MM + 2 * MARGIN_MM,
        heightMm: t.maxCutBackMm + 3 * MARGIN_MM,
        originMm: { x: MARGIN_MM, y: MARGIN_MM * 1.5 },
        outline,
        closed: false,
        stations,
        guides: [
          { from: { x: 0, y: 0 }, to: { x: wrap, y: 0 }, label: 'DATUM — square line round the branch' },
        ],
        wrapEndMm: wrap,
        instructions: [
          'Cut out along the outer edge and the cut line. Wrap the datum edge square round the branch end, stations 0 at the top (over the header crest); tape the tab under the start.',
          'Scribe along the cut line, remove the template, cut on the waste side and bevel to the WPS.',
          t.angleOrigin,
        ],
        facts: [
          `Branch OD ${L(branchOd)}, header OD ${L(headerOd)}`,
          `Deepest cut-back ${L(t.maxCutBackMm)}`,
          ...t.notes,
        ],
      });
      // Header hole: the outline round the header (x) and along it (y), crest line and branch centreline as guides.
      const hole = fineStations.map((s) => ({ x: s.headerHoleArcMm, y: s.headerHoleAlongMm }));
      const minX = Math.min(...hole.map((p) => p.x));
      const maxX = Math.max(...hole.map((p) => p.x));
      const minY = Math.min(...hole.map((p) => p.y));
      const maxY = Math.max(...hole.map((p) => p.y));
      const extra = 10;
      figures.push({
        kind: 'header-hole',
        title: `Header hole ${marks.get(c.nodeId) ?? '?'} · ${label}`,
        nodeId: c.nodeId,
        widthMm: maxX - minX + 2 * extra + MARGIN_MM,
        heightMm: maxY - minY + 2 * extra + MARGIN_MM,
        originMm: { x: MARGIN_MM / 2 + extra - minX, y: MARGIN_MM / 2 + extra - minY },
        outline: hole,
        closed: true,
        stations: [],
        guides: [
          {
            from: { x: 0, y: minY - extra * 0.8 },
            to: { x: 0, y: maxY + extra * 0.8 },
            label: 'HEADER CREST LINE',
          },
          {
            from: { x: minX - extra * 0.8, y: 0 },
            to: { x: maxX + extra * 0.8, y: 0 },
            label: 'BRANCH CENTRELINE',
          },
        ],
        wrapEndMm: null,
        instructions: [
          'Lay the template on the header with the crest line on the header’s top centreline and the branch centreline at the branch position; it bends round the pipe.',
          `Scribe the hole (laid out to ${L(t.holeDiameterMm)}), cut inside the line and dress to the WPS.`,
        ],
        facts: [`Hole ${L(t.holeDiameterMm)}, header OD ${L(headerOd)}`],
      });
    }
    if (shape.type === 'elbow' && shape.construction === 'mitre') {
      const end = c.ends[0];
      const od = end?.odMm ?? null;
      if (od === null) {
        problems.push(`No template for mitred bend ${marks.get(c.nodeId) ?? '?'}: pipe OD unknown.`);
        continue;
      }
      const welds = shape.mitreWelds ?? 2;
      const calc = mitreTemplate({
        odMm: od,
        bendAngleDeg: shape.angleDeg,
        pieces: welds + 1,
        stations: stationCount(od),
        radiusMm: shape.bendRadiusMm,
      });
      if (!calc.ok) {
        problems.push(`No template for mitred bend ${marks.get(c.nodeId) ?? '?'}: ${calc.message}`);
        continue;
      }
      const t = calc.value;
      const stations = t.stations.map((s) => ({
        x: s.wrapMm,
        y: s.ordinateMm,
        label: `${s.index}`,
        ordinateMm: s.ordinateMm,
      }));
      const fine = mitreTemplate({
        odMm: od,
        bendAngleDeg: shape.angleDeg,
        pieces: welds + 1,
        stations: 360,
      });
      const outline = [
        ...(fine.ok ? fine.value.stations : t.stations).map((s) => ({ x: s.wrapMm, y: s.ordinateMm })),
        { x: t.circumferenceMm, y: 0 },
      ];
      figures.push({
        kind: 'mitre',
        title: `Mitre cut ${marks.get(c.nodeId) ?? '?'} · ${Number(t.cutAngleDeg.toFixed(2))}° from square · NPS ${c.nps ?? '?'}`,
        nodeId: c.nodeId,
        widthMm: t.circumferenceMm + TAB_MM + 2 * MARGIN_MM,
        heightMm: t.longShortDifferenceMm + 3 * MARGIN_MM,
        originMm: { x: MARGIN_MM, y: MARGIN_MM * 1.5 },
        outline,
        closed: false,
        stations,
        guides: [
          {
            from: { x: 0, y: 0 },
            to: { x: t.circumferenceMm, y: 0 },
            label: 'DATUM — square line through the throat',
          },
        ],
        wrapEndMm: t.circumferenceMm,
        instructions: [
          'Wrap the datum edge square round the pipe, station 0 on the throat (inside of the bend); tape the tab under the start.',
          `Scribe and cut each mitred face (${welds} welds, ${Number(t.deflectionPerWeldDeg.toFixed(2))}° per weld).`,
          t.angleOrigin,
        ],
        facts: [
          `OD ${L(od)}, long-to-short ${L(t.longShortDifferenceMm)}`,
          ...(t.pieces ?? []).map(
            (p) =>
              `Piece ${p.index + 1} (${p.kind}): centreline ${L(p.centrelineMm)}, throat ${L(p.throatMm)}, back ${L(p.backMm)}`,
          ),
        ],
      });
    }
  }
  return { figures, problems };
}

function dot(a: { x: number; y: number; z: number }, b: { x: number; y: number; z: number }): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}
