import type { SpoolDesign } from '../schemas/spool-design.schema';
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import type { SpoolRun } from '../schemas/spool-design-run.schema';
import { clockReference } from './clock-angles';
import type { SpoolResult } from './compute-result';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';

/**
 * What a change undoes on the shop floor, earliest first:
 * - `cut`: a pipe piece must be cut again (or a fitting changed): back to before cutting;
 * - `fit`: the pieces stand but must be fitted again (a turned outlet, a flange's holes);
 * - `weld`: the fit-up stands but the welding changes (a weld added, removed or retyped);
 * - `none`: nothing the bay has done is undone (a weight, a tolerance, a note).
 */
export type ShopStageUndone = 'cut' | 'fit' | 'weld' | 'none';

/** One difference between two revisions of a spool, in shop words. */
export interface RevisionDifference {
  /** What kind of thing changed. */
  subject: 'component' | 'run' | 'piece' | 'flange' | 'weld' | 'spec' | 'weight';
  /** The shop mark or name of the thing (e.g. `E2`, `P3`, `W5`, `root gap`). */
  item: string;
  change: 'added' | 'removed' | 'changed';
  /** One sentence for the sheet and the screen, e.g. `P3: cut length was 412 mm, now 462 mm.` */
  text: string;
  /** The earliest shop stage the change undoes. */
  undoes: ShopStageUndone;
  /** The design element it concerns (for highlighting; never shown to users). */
  ref?: { nodeId?: string; runId?: string };
}

/** Names a node for users: its shop mark (never the design's internal id). */
export type NodeMarker = (nodeId: string) => string;

/** Formats a length in mm for the user's units. */
export type LengthWriter = (mm: number) => string;

/** Side of a revision compared: its design and the engine's result of it. */
export interface RevisionSide {
  design: SpoolDesign;
  result: SpoolResult;
  /** Marks of this revision's nodes. */
  markOf: NodeMarker;
}

const LENGTH_TOLERANCE_MM = 0.05;
const POSITION_TOLERANCE_MM = 0.5;
const ANGLE_TOLERANCE_DEG = 0.05;
const DIRECTION_TOLERANCE_DEG = 0.1;
const WEIGHT_TOLERANCE = 0.01;

const STAGE_ORDER: readonly ShopStageUndone[] = ['cut', 'fit', 'weld', 'none'];

/** The earliest stage any of `differences` undoes (`none` when there are none). */
export function earliestStageUndone(differences: readonly RevisionDifference[]): ShopStageUndone {
  let best = STAGE_ORDER.length - 1;
  for (const d of differences) best = Math.min(best, STAGE_ORDER.indexOf(d.undoes));
  return STAGE_ORDER[best]!;
}

/**
 * Every difference between two revisions of one spool, component by component: each node's
 * type, size, position and orientation, each run's length, direction and size, every spec
 * value, each piece's cut length, size, material and ends, each flange's bolt holes, each weld
 * and the empty weight. Nodes and runs are matched by their design ids (stable across
 * revisions of one spool); pieces and welds by their marks.
 */
export function revisionDifferences(
  before: RevisionSide,
  after: RevisionSide,
  length: LengthWriter,
): RevisionDifference[] {
  const out: RevisionDifference[] = [];
  compareSpec(before.design, after.design, length, out);
  compareNodes(before, after, length, out);
  compareRuns(before, after, length, out);
  comparePieces(before.result, after.result, length, out);
  compareFlanges(before, after, out);
  compareWelds(before.result, after.result, out);
  const we = before.result.weights.emptyKg;
  const wn = after.result.weights.emptyKg;
  if (we > 0 && Math.abs(wn - we) / we > WEIGHT_TOLERANCE)
    out.push({
      subject: 'weight',
      item: 'empty weight',
      change: 'changed',
      text: `Empty weight ${wn.toFixed(1)} kg, was ${we.toFixed(1)} kg.`,
      undoes: 'none',
    });
  return out;
}

/** Spec fields in shop words, and the stage a change to each undoes. */
const SPEC_FIELDS: Record<string, { label: string; undoes: ShopStageUndone; mm?: boolean }> = {
  nps: { label: 'line size', undoes: 'cut' },
  material: { label: 'pipe material', undoes: 'cut' },
  fittingMaterial: { label: 'fitting material', undoes: 'cut' },
  flangeMaterial: { label: 'flange material', undoes: 'cut' },
  schedule: { label: 'schedule', undoes: 'cut' },
  flangeClass: { label: 'flange class', undoes: 'cut' },
  rootGapMm: { label: 'root gap', undoes: 'cut', mm: true },
  sawKerfMm: { label: 'saw kerf', undoes: 'none', mm: true },
  minPieceLengthMm: { label: 'shortest piece', undoes: 'none', mm: true },
  socketGapMm: { label: 'socket expansion gap', undoes: 'cut', mm: true },
  boltHoleToleranceMm: { label: 'bolt-hole tolerance', undoes: 'none', mm: true },
};

function specText(key: string, value: unknown, length: LengthWriter): string {
  if (value === undefined) return 'the job default';
  if (SPEC_FIELDS[key]?.mm && typeof value === 'number') return length(value);
  if (key === 'nps') return `NPS ${String(value)}`;
  if (key === 'flangeClass') return `Class ${String(value)}`;
  return typeof value === 'object' ? JSON.stringify(value) : String(value);
}

function compareSpecObjects(
  where: string,
  a: Record<string, unknown> | undefined,
  b: Record<string, unknown> | undefined,
  length: LengthWriter,
  out: RevisionDifference[],
): void {
  const keys = new Set([...Object.keys(a ?? {}), ...Object.keys(b ?? {})]);
  for (const key of [...keys].sort()) {
    const va = a?.[key];
    const vb = b?.[key];
    if (JSON.stringify(va) === JSON.stringify(vb)) continue;
    const field = SPEC_FIELDS[key] ?? { label: key, undoes: 'cut' as const };
    out.push({
      subject: 'spec',
      item: field.label,
      change: 'changed',
      text: `${where}${field.label} was ${specText(key, va, length)}, now ${specText(key, vb, length)}.`,
      undoes: field.undoes,
    });
  }
}

function compareSpec(a: SpoolDesign, b: SpoolDesign, length: LengthWriter, out: RevisionDifference[]): void {
  compareSpecObjects('Spool spec: ', a.spec, b.spec, length, out);
}

/** A node's kind in words. */
const KIND_NAMES: Record<SpoolNode['kind'], string> = {
  end: 'open end',
  elbow: 'elbow',
  return: 'return',
  tee: 'tee',
  'set-on-branch': 'set-on branch',
  'half-coupling': 'half coupling',
  'branch-outlet': 'branch outlet',
  reducer: 'reducer',
  'socket-fitting': 'socket-weld fitting',
};

function nodeName(node: SpoolNode): string {
  if (node.kind === 'end') return endName(node.end.type);
  return KIND_NAMES[node.kind];
}

function endName(type: string): string {
  return type.replace(/-/g, ' ');
}

/** The fields of a node other than its id, spec and sheet label, flattened to "path → value". */
function nodeFields(node: SpoolNode): Map<string, unknown> {
  const fields = new Map<string, unknown>();
  const walk = (prefix: string, value: unknown) => {
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
      for (const [k, v] of Object.entries(value as Record<string, unknown>)) walk(prefix ? `${prefix}.${k}` : k, v);
    } else fields.set(prefix, value);
  };
  const { id: _id, spec: _spec, label: _label, kind: _kind, ...rest } = node as SpoolNode & Record<string, unknown>;
  walk('', rest);
  return fields;
}

/** Node fields in shop words, and what a change to each undoes. */
const NODE_FIELDS: Record<string, { label: string; undoes: ShopStageUndone; deg?: boolean }> = {
  nps: { label: 'size', undoes: 'cut' },
  branchNps: { label: 'branch size', undoes: 'cut' },
  toNps: { label: 'small end size', undoes: 'cut' },
  radius: { label: 'radius', undoes: 'cut' },
  construction: { label: 'made as', undoes: 'cut' },
  mitreWelds: { label: 'mitre welds', undoes: 'cut' },
  'offsetDirection.x': { label: 'offset direction (east)', undoes: 'fit' },
  'offsetDirection.y': { label: 'offset direction (north)', undoes: 'fit' },
  'offsetDirection.z': { label: 'offset direction (up)', undoes: 'fit' },
  outletEnd: { label: 'outlet end', undoes: 'cut' },
  heightMm: { label: 'outlet height', undoes: 'cut' },
  type: { label: 'type', undoes: 'cut' },
  flatSide: { label: 'flat side', undoes: 'fit' },
  'flatSide.x': { label: 'flat side (east)', undoes: 'fit' },
  'flatSide.y': { label: 'flat side (north)', undoes: 'fit' },
  'flatSide.z': { label: 'flat side (up)', undoes: 'fit' },
  orientationDeg: { label: 'orientation', undoes: 'fit', deg: true },
  'end.type': { label: 'end', undoes: 'cut' },
  'end.flangeClass': { label: 'flange class', undoes: 'cut' },
  'end.boltRotationDeg': { label: 'first bolt hole', undoes: 'fit', deg: true },
  'end.mustTwoHole': { label: 'two-holing', undoes: 'fit' },
  'end.blind': { label: 'blind flange', undoes: 'none' },
  'end.fieldWeld': { label: 'field weld', undoes: 'weld' },
  'end.fieldFitAllowanceMm': { label: 'field-fit allowance', undoes: 'cut' },
};

function fieldText(key: string, value: unknown, length: LengthWriter): string {
  if (value === undefined) return 'not set';
  if (key.endsWith('Mm') && typeof value === 'number') return length(value);
  if (NODE_FIELDS[key]?.deg && typeof value === 'number') return `${Number(value.toFixed(1))}°`;
  if (key === 'nps' || key === 'branchNps' || key === 'toNps') return `NPS ${String(value)}`;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return value.replace(/-/g, ' ');
  return String(value);
}

function compareNodes(
  before: RevisionSide,
  after: RevisionSide,
  length: LengthWriter,
  out: RevisionDifference[],
): void {
  const old = new Map(before.design.nodes.map((n) => [n.id, n]));
  const now = new Map(after.design.nodes.map((n) => [n.id, n]));
  const oldPos = new Map(before.result.components.map((c) => [c.nodeId, c.position]));
  const newPos = new Map(after.result.components.map((c) => [c.nodeId, c.position]));
  for (const [id, node] of now) {
    const mark = after.markOf(id);
    const was = old.get(id);
    if (!was) {
      out.push({
        subject: 'component',
        item: mark,
        change: 'added',
        text: `${mark} added: ${nodeName(node)}.`,
        undoes: 'cut',
        ref: { nodeId: id },
      });
      continue;
    }
    const what: string[] = [];
    let undoes: ShopStageUndone = 'none';
    const raise = (stage: ShopStageUndone) => {
      if (STAGE_ORDER.indexOf(stage) < STAGE_ORDER.indexOf(undoes)) undoes = stage;
    };
    if (was.kind !== node.kind) {
      what.push(`was ${nodeName(was)}, now ${nodeName(node)}`);
      raise('cut');
    } else {
      const fa = nodeFields(was);
      const fb = nodeFields(node);
      for (const key of [...new Set([...fa.keys(), ...fb.keys()])].sort()) {
        const va = fa.get(key);
        const vb = fb.get(key);
        if (JSON.stringify(va) === JSON.stringify(vb)) continue;
        if (typeof va === 'number' && typeof vb === 'number' && Math.abs(va - vb) <= ANGLE_TOLERANCE_DEG) continue;
        const field = NODE_FIELDS[key] ?? { label: key.replace(/\./g, ' '), undoes: 'cut' as const };
        const from = key === 'orientationDeg' ? orientationZero(after.result, id) : '';
        what.push(`${field.label} was ${fieldText(key, va, length)}${from}, now ${fieldText(key, vb, length)}${from}`);
        raise(field.undoes);
      }
    }
    const pa = oldPos.get(id);
    const pb = newPos.get(id);
    if (pa && pb) {
      const moved = Math.hypot(pb.x - pa.x, pb.y - pa.y, pb.z - pa.z);
      if (moved > POSITION_TOLERANCE_MM) {
        what.push(`moved ${length(moved)}`);
        raise('fit');
      }
    }
    if (what.length > 0)
      out.push({
        subject: 'component',
        item: mark,
        change: 'changed',
        text: `${mark}: ${what.join('; ')}.`,
        undoes,
        ref: { nodeId: id },
      });
    compareSpecObjects(`${mark} spec: `, was.spec, node.spec, length, out);
  }
  for (const [id, node] of old)
    if (!now.has(id)) {
      const mark = before.markOf(id);
      out.push({
        subject: 'component',
        item: mark,
        change: 'removed',
        text: `${mark} removed (${nodeName(node)}).`,
        undoes: 'cut',
      });
    }
}

/** " from top of pipe" / " from plant north": what 0° is for an outlet on its header. */
function orientationZero(result: SpoolResult, nodeId: string): string {
  const shape = result.components.find((c) => c.nodeId === nodeId)?.shape;
  if (shape?.type !== 'branch-connection') return '';
  return clockReference(unitVector(shape.headerAxis)).reference === 'plant-north'
    ? ' from plant north'
    : ' from top of pipe';
}

function unitVector(v: Vec3): Vec3 {
  const l = Math.hypot(v.x, v.y, v.z) || 1;
  return { x: v.x / l, y: v.y / l, z: v.z / l };
}

function runName(run: SpoolRun, side: RevisionSide): string {
  const piece = side.result.runs.find((r) => r.runId === run.id)?.pieceMark;
  const span = `${side.markOf(run.from)} to ${side.markOf(run.to)}`;
  return piece ? `${piece} (${span})` : `the run ${span}`;
}

function compareRuns(
  before: RevisionSide,
  after: RevisionSide,
  length: LengthWriter,
  out: RevisionDifference[],
): void {
  const old = new Map(before.design.runs.map((r) => [r.id, r]));
  const oldResults = new Map(before.result.runs.map((r) => [r.runId, r]));
  const newResults = new Map(after.result.runs.map((r) => [r.runId, r]));
  for (const run of after.design.runs) {
    const name = runName(run, after);
    const was = old.get(run.id);
    if (!was) {
      out.push({
        subject: 'run',
        item: name,
        change: 'added',
        text: `${cap(name)} added.`,
        undoes: 'cut',
        ref: { runId: run.id },
      });
      continue;
    }
    const what: string[] = [];
    let undoes: ShopStageUndone = 'none';
    const ra = oldResults.get(run.id);
    const rb = newResults.get(run.id);
    if (ra && rb) {
      if (differs(ra.workPointDistanceMm, rb.workPointDistanceMm, LENGTH_TOLERANCE_MM)) {
        what.push(`work-point length was ${length(ra.workPointDistanceMm)}, now ${length(rb.workPointDistanceMm)}`);
        undoes = 'cut';
      }
      const deg = angleBetweenDeg(ra.direction, rb.direction);
      // Result directions are rounded to 3 decimals: allow for that before calling it a turn.
      if (deg > DIRECTION_TOLERANCE_DEG) {
        what.push(`direction turned ${Number(deg.toFixed(1))}°`);
        if (undoes === 'none') undoes = 'fit';
      }
      if (ra.nps !== rb.nps || ra.schedule !== rb.schedule) {
        what.push(`size was NPS ${ra.nps ?? '?'} ${ra.schedule}, now NPS ${rb.nps ?? '?'} ${rb.schedule}`);
        undoes = 'cut';
      }
    }
    if (was.length.kind !== run.length.kind)
      what.push(`dimensioned ${was.length.kind.replace(/-/g, ' ')}, now ${run.length.kind.replace(/-/g, ' ')}`);
    if ((was.heat ?? '') !== (run.heat ?? '')) what.push(`heat was ${was.heat ?? 'not set'}, now ${run.heat ?? 'not set'}`);
    if (what.length > 0)
      out.push({
        subject: 'run',
        item: name,
        change: 'changed',
        text: `${cap(name)}: ${what.join('; ')}.`,
        undoes,
        ref: { runId: run.id },
      });
    compareSpecObjects(`${cap(name)} spec: `, was.spec, run.spec, length, out);
  }
  const now = new Set(after.design.runs.map((r) => r.id));
  for (const run of before.design.runs)
    if (!now.has(run.id)) {
      const name = runName(run, before);
      out.push({ subject: 'run', item: name, change: 'removed', text: `${cap(name)} removed.`, undoes: 'cut' });
    }
}

function comparePieces(a: SpoolResult, b: SpoolResult, length: LengthWriter, out: RevisionDifference[]): void {
  const L = (mm: number | null) => (mm === null ? 'not computed' : length(mm));
  const before = new Map(a.pieces.map((p) => [p.mark, p]));
  const after = new Map(b.pieces.map((p) => [p.mark, p]));
  for (const [mark, p] of after) {
    const old = before.get(mark);
    if (!old) {
      out.push({
        subject: 'piece',
        item: mark,
        change: 'added',
        text: `${mark} added: NPS ${p.nps} ${p.schedule}, cut ${L(p.cutLengthMm)}.`,
        undoes: 'cut',
      });
      continue;
    }
    const what: string[] = [];
    if (differs(old.cutLengthMm, p.cutLengthMm, LENGTH_TOLERANCE_MM))
      what.push(`cut length was ${L(old.cutLengthMm)}, now ${L(p.cutLengthMm)}`);
    if (old.nps !== p.nps || old.schedule !== p.schedule)
      what.push(`size was NPS ${old.nps} ${old.schedule}, now NPS ${p.nps} ${p.schedule}`);
    if (old.material !== p.material) what.push(`material was ${old.material}, now ${p.material}`);
    const endsBefore = `${old.ends[0].label} / ${old.ends[1].label}`;
    const endsAfter = `${p.ends[0].label} / ${p.ends[1].label}`;
    if (endsBefore !== endsAfter) what.push(`ends were ${endsBefore}, now ${endsAfter}`);
    if (what.length > 0)
      out.push({ subject: 'piece', item: mark, change: 'changed', text: `${mark}: ${what.join('; ')}.`, undoes: 'cut' });
  }
  for (const mark of before.keys())
    if (!after.has(mark))
      out.push({ subject: 'piece', item: mark, change: 'removed', text: `${mark} removed.`, undoes: 'cut' });
}

function compareFlanges(before: RevisionSide, after: RevisionSide, out: RevisionDifference[]): void {
  const old = new Map(before.result.flanges.map((f) => [f.nodeId, f]));
  for (const f of after.result.flanges) {
    const was = old.get(f.nodeId);
    const mark = after.markOf(f.nodeId);
    // An added flange is already listed as an added component or a changed end.
    if (!was) continue;
    const what: string[] = [];
    if (differs(was.rotationDeg, f.rotationDeg, ANGLE_TOLERANCE_DEG))
      what.push(`hole 1 was at ${fmtDeg(was.rotationDeg)}, now ${fmtDeg(f.rotationDeg)}`);
    if (was.boltCount !== f.boltCount) what.push(`${f.boltCount ?? '?'} holes, was ${was.boltCount ?? '?'}`);
    if (was.flangeClass !== f.flangeClass) what.push(`Class ${f.flangeClass}, was Class ${was.flangeClass}`);
    if (what.length > 0)
      out.push({
        subject: 'flange',
        item: mark,
        change: 'changed',
        text: `${mark} bolt holes: ${what.join('; ')}.`,
        undoes: was.flangeClass !== f.flangeClass ? 'cut' : 'fit',
        ref: { nodeId: f.nodeId },
      });
  }
}

function compareWelds(a: SpoolResult, b: SpoolResult, out: RevisionDifference[]): void {
  const before = new Map(a.welds.map((w) => [w.mark, w]));
  const after = new Map(b.welds.map((w) => [w.mark, w]));
  for (const [mark, w] of after) {
    const old = before.get(mark);
    if (!old) {
      out.push({
        subject: 'weld',
        item: mark,
        change: 'added',
        text: `${mark} added: ${w.type} NPS ${w.nps}, ${w.location}.`,
        undoes: 'weld',
      });
      continue;
    }
    const what: string[] = [];
    if (old.type !== w.type) what.push(`was ${old.type}, now ${w.type}`);
    if (old.nps !== w.nps) what.push(`size was NPS ${old.nps}, now NPS ${w.nps}`);
    if (old.location !== w.location) what.push(`was a ${old.location} weld, now ${w.location}`);
    if (what.length > 0)
      out.push({ subject: 'weld', item: mark, change: 'changed', text: `${mark}: ${what.join('; ')}.`, undoes: 'weld' });
  }
  for (const mark of before.keys())
    if (!after.has(mark))
      out.push({ subject: 'weld', item: mark, change: 'removed', text: `${mark} removed.`, undoes: 'weld' });
}

function differs(a: number | null, b: number | null, tolerance: number): boolean {
  if (a === null || b === null) return a !== b;
  return Math.abs(a - b) > tolerance;
}

/** Angle between two directions of any length, degrees. */
function angleBetweenDeg(a: Vec3, b: Vec3): number {
  const cross = Math.hypot(a.y * b.z - a.z * b.y, a.z * b.x - a.x * b.z, a.x * b.y - a.y * b.x);
  return (Math.atan2(cross, a.x * b.x + a.y * b.y + a.z * b.z) * 180) / Math.PI;
}

function fmtDeg(deg: number): string {
  return `${Number(deg.toFixed(1))}°`;
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
