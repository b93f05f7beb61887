import { memo, useEffect, useMemo, type RefObject } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import { Vector3 } from 'three';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { formatLength, type LengthUnits } from '../../../../shared/units/length-format';
import type { ViewPrefs } from '../model/view-prefs';
import type { Selection } from '../model/editor-selection';
import { toScene } from './scene-units';
import { isFlangeFace } from '../model/design-edit';
import { placeLabels, type LabelBox } from './label-placer';

const KIND_SHORT = {
  'centre-to-centre': 'C–C',
  'centre-to-face': 'C–F',
  'face-to-face': 'F–F',
  cut: 'C–C',
} as const;

/** One label over the model: a plant point (scene units) and its text. */
export type SceneLabel = {
  key: string;
  at: [number, number, number];
  text: string;
  tone: 'dim' | 'cut' | 'weld' | 'cog' | 'axis' | 'north';
  /** Text colour for axis letters (the axis colour). */
  colour?: string;
};
type Label = SceneLabel;

/**
 * The dimension labels to show: work-point dimensions of runs, cut lengths of pieces,
 * weld numbers and the centre of gravity, each toggled in the view settings, in the job's
 * units. Past {@link MAX_LABELS} only those around the selection are kept.
 */
export function buildLabelItems({
  result,
  design,
  labels,
  units,
  selection,
  cog,
}: {
  result: SpoolResult;
  design: SpoolDesign;
  labels: ViewPrefs['labels'];
  units: LengthUnits;
  selection: Selection;
  /** The centre-of-gravity label, when shown. */
  cog?: { at: [number, number, number]; emptyKg: number } | null;
}): SceneLabel[] {
  const ends = new Set(design.nodes.filter((n) => n.kind === 'end').map((n) => n.id));
  const faces = new Set(design.nodes.filter((n) => isFlangeFace(n)).map((n) => n.id));
  const out: Label[] = [];
  const box = result.overall?.workPointBox;
  const centre = box
    ? { x: (box.min.x + box.max.x) / 2, y: (box.min.y + box.max.y) / 2, z: (box.min.z + box.max.z) / 2 }
    : { x: 0, y: 0, z: 0 };
  const od = new Map<string, number>();
  for (const p of result.pieces) if (p.odMm) for (const id of p.runIds) od.set(id, p.odMm);
  for (const run of result.runs) {
    const open = ends.has(run.from) || ends.has(run.to);
    if (open ? !labels.centreToFace : !labels.centreToCentre) continue;
    if (run.workPointDistanceMm <= 0) continue;
    const mid = {
      x: (run.start.x + run.end.x) / 2,
      y: (run.start.y + run.end.y) / 2,
      z: (run.start.z + run.end.z) / 2,
    };
    const faceCount = Number(faces.has(run.from)) + Number(faces.has(run.to));
    const kind = faceCount === 2 ? 'face-to-face' : faceCount === 1 ? 'centre-to-face' : 'centre-to-centre';
    // Dimension lines sit outside the spool, like on a drawing, clear of the cut labels on the pipe.
    const at = offsetOutward(mid, run.direction, centre, Math.max(150, (od.get(run.runId) ?? 100) * 1.1));
    out.push({
      key: `d-${run.runId}`,
      at: toScene(at),
      text: `${KIND_SHORT[kind]} ${formatLength(run.workPointDistanceMm, units)}`,
      tone: 'dim',
    });
  }
  if (labels.cutLengths) {
    for (const p of result.pieces) {
      if (p.cutLengthMm === null) continue;
      const mid = {
        x: (p.start.x + p.end.x) / 2,
        y: (p.start.y + p.end.y) / 2,
        z: (p.start.z + p.end.z) / 2,
      };
      out.push({
        key: `c-${p.mark}`,
        at: toScene(mid),
        text: `${p.mark} cut ${formatLength(p.cutLengthMm, units)}`,
        tone: 'cut',
      });
    }
  }
  if (labels.welds) {
    for (const w of result.welds)
      out.push({ key: `w-${w.mark}`, at: toScene(w.position), text: w.mark, tone: 'weld' });
  }
  if (cog) {
    out.push({
      key: 'g-cog',
      at: cog.at,
      text: `CoG · ${Math.round(cog.emptyKg).toLocaleString('en-GB')} kg est.`,
      tone: 'cog',
    });
  }
  if (out.length <= MAX_LABELS) return out;
  // Too many to read (and to move every frame): keep those around the selection.
  const near = nearSelection(design, selection);
  const piecesNear = new Set(
    result.pieces.filter((p) => p.runIds.some((id) => near.runs.has(id))).map((p) => p.mark),
  );
  const weldsNear = new Set(
    result.welds
      .filter((w) => near.nodes.has(w.nodeId) || (w.runId && near.runs.has(w.runId)))
      .map((w) => w.mark),
  );
  return out.filter((l) => {
    const id = l.key.slice(2);
    if (l.key.startsWith('g-')) return true;
    return l.key.startsWith('d-')
      ? near.runs.has(id)
      : l.key.startsWith('c-')
        ? piecesNear.has(id)
        : weldsNear.has(id);
  });
}

/**
 * Labels as plain DOM over the canvas (crisp at any zoom, readable by screen readers and
 * tests). They live in the page's own React root, not one root per label, so adding and
 * removing labels never unmounts a root during the 3D renderer's commit;
 * {@link LabelProjector} moves them each rendered frame without React state.
 */
export const LabelOverlay = memo(function LabelOverlay({
  items,
  hidden,
  overlayRef,
}: {
  items: SceneLabel[];
  hidden: boolean;
  overlayRef: RefObject<HTMLDivElement | null>;
}) {
  return (
    <div
      ref={overlayRef}
      className={`pointer-events-none absolute inset-0 overflow-hidden ${hidden ? 'invisible' : ''}`}
      aria-hidden={hidden}
    >
      {items.map((l, i) => (
        <span
          key={l.key}
          data-i={i}
          className={`absolute left-0 top-0 ${TONE_CLASS[l.tone]}`}
          data-label={l.tone}
          style={{ display: 'none', color: l.colour }}
        >
          {l.text}
        </span>
      ))}
    </div>
  );
});

/** Inside the canvas: projects each label's point to the overlay every rendered frame. */
export function LabelProjector({
  items,
  overlayRef,
}: {
  items: SceneLabel[];
  overlayRef: RefObject<HTMLDivElement | null>;
}) {
  const scratch = useMemo(() => new Vector3(), []);
  const invalidate = useThree((s) => s.invalidate);
  // New labels need one frame to be placed.
  useEffect(() => invalidate(), [items, invalidate]);
  // Label sizes, measured once per label text (reading layout every frame would be slow).
  const sizes = useMemo(() => new Map<string, { w: number; h: number }>(), []);
  useFrame(({ camera, size }) => {
    const overlay = overlayRef.current;
    if (!overlay) return;
    const spans = Array.from(overlay.children) as HTMLElement[];
    const boxes: LabelBox[] = [];
    for (const el of spans) {
      const item = items[Number(el.dataset.i)];
      scratch.set(item?.at[0] ?? 0, item?.at[1] ?? 0, item?.at[2] ?? 0).project(camera);
      const behind = !item || scratch.z < -1 || scratch.z > 1;
      const sizeKey = item ? `${item.tone}:${item.text}` : '';
      let s = sizes.get(sizeKey);
      if (!s && item) {
        el.style.display = 'block';
        s = { w: el.offsetWidth, h: el.offsetHeight };
        if (s.w > 0) sizes.set(sizeKey, s);
      }
      boxes.push({
        x: behind ? Number.NaN : ((scratch.x + 1) / 2) * size.width,
        y: behind ? Number.NaN : ((1 - scratch.y) / 2) * size.height,
        width: s?.w ?? 0,
        height: s?.h ?? 0,
        priority: item ? TONE_PRIORITY[item.tone] : 9,
      });
    }
    // None covers another: dimensions and cuts keep their spots, weld tags move aside.
    const placed = placeLabels(boxes, { width: size.width, height: size.height });
    placed.forEach((p, i) => {
      const el = spans[i]!;
      if (!p.visible) {
        el.style.display = 'none';
        return;
      }
      el.style.display = 'block';
      el.style.transform = `translate(${p.x.toFixed(1)}px, ${p.y.toFixed(1)}px) translate(-50%, -50%)`;
    });
  });
  return null;
}

/** Most labels drawn at once; past this only those around the selection show. */
export const MAX_LABELS = 150;

/** True when a result has more labels than are drawn at once. */
export function labelsThinned(result: SpoolResult): boolean {
  return result.runs.length + result.pieces.length + result.welds.length > MAX_LABELS;
}

/** The selected run or node, its neighbouring runs and their nodes. */
function nearSelection(design: SpoolDesign, selection: Selection): { runs: Set<string>; nodes: Set<string> } {
  const runs = new Set<string>();
  const nodes = new Set<string>();
  if (!selection) return { runs, nodes };
  if (selection.type === 'node') nodes.add(selection.id);
  else {
    const r = design.runs.find((x) => x.id === selection.id);
    if (r) {
      nodes.add(r.from);
      nodes.add(r.to);
    }
  }
  for (const r of design.runs) if (nodes.has(r.from) || nodes.has(r.to)) runs.add(r.id);
  for (const r of design.runs)
    if (runs.has(r.id)) {
      nodes.add(r.from);
      nodes.add(r.to);
    }
  return { runs, nodes };
}

type P = { x: number; y: number; z: number };

/** `mid` moved `distanceMm` away from the spool's centre, square to the run (straight up if the run points at the centre). */
function offsetOutward(mid: P, direction: P, centre: P, distanceMm: number): P {
  const away = { x: mid.x - centre.x, y: mid.y - centre.y, z: mid.z - centre.z };
  const along = away.x * direction.x + away.y * direction.y + away.z * direction.z;
  let n = {
    x: away.x - along * direction.x,
    y: away.y - along * direction.y,
    z: away.z - along * direction.z,
  };
  let len = Math.hypot(n.x, n.y, n.z);
  if (len < 1e-6) {
    n = Math.abs(direction.z) > 0.9 ? { x: 1, y: 0, z: 0 } : { x: 0, y: 0, z: 1 };
    len = 1;
  }
  return {
    x: mid.x + (n.x / len) * distanceMm,
    y: mid.y + (n.y / len) * distanceMm,
    z: mid.z + (n.z / len) * distanceMm,
  };
}

/** Placement order: lower keeps its spot first. */
const TONE_PRIORITY: Record<Label['tone'], number> = { north: 0, axis: 0, cog: 1, cut: 2, dim: 3, weld: 4 };

const TONE_CLASS: Record<Label['tone'], string> = {
  dim: 'block whitespace-nowrap rounded bg-white/90 px-1.5 py-0.5 font-mono text-[11px] font-semibold text-ink-800 shadow-sm ring-1 ring-steel-300',
  cut: 'block whitespace-nowrap rounded bg-spark-100/95 px-1.5 py-0.5 font-mono text-[11px] font-semibold text-spark-700 ring-1 ring-spark-300',
  weld: 'block whitespace-nowrap rounded-full bg-ink-800 px-1.5 py-0.5 font-mono text-[10px] font-bold text-white',
  cog: 'block whitespace-nowrap rounded bg-state-shipped-bg px-1.5 py-0.5 text-[11px] font-semibold text-state-shipped-fg',
  axis: 'block font-mono text-[11px] font-bold',
  north: 'block font-display text-sm font-bold text-ok-600',
};
