import { memo, useMemo } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { Selection } from '../model/editor-selection';
import { ComponentMesh } from './ComponentMesh';
import { colourFor } from './component-colour';
import { InstancedSpheres, type SphereInstance } from './InstancedSpheres';
import { InstancedWeldRings, type WeldRingInstance } from './InstancedWeldRings';
import { pickHandler } from './PipeSegment';
import { InstancedPipes, type PipeInstance } from './InstancedPipes';
import { SCENE_COLOURS } from './scene-palette';
import { flangesById, largestOd, nearestRun, severityById } from './scene-lookups';
import { SCENE_UNITS_PER_MM } from './scene-units';

/**
 * The spool, true size, from the engine result: pipe pieces, fittings, flanges with bolt
 * holes, work-point markers and weld beads (pipes, markers and beads instanced: one draw
 * call each).
 * Pure view: clicks go out through `onSelect`.
 */
export const SpoolModel = memo(function SpoolModel({
  result,
  selection,
  onSelect,
}: {
  result: SpoolResult;
  selection: Selection;
  onSelect: (selection: Selection) => void;
}) {
  const severity = useMemo(() => severityById(result), [result]);
  const flanges = useMemo(() => flangesById(result), [result]);
  const markerMm = useMemo(() => Math.max(12, largestOd(result) * 0.12), [result]);
  const selectedId = selection?.id ?? null;

  // Pieces the engine could size; indices of `pipes` and `pieces` match.
  const pieces = useMemo(() => result.pieces.filter((p) => p.odMm), [result]);
  const pipes = useMemo<PipeInstance[]>(
    () =>
      pieces.map((piece) => {
        const selected = selectedId !== null && piece.runIds.includes(selectedId);
        const sev = piece.runIds.map((id) => severity.get(id)).find(Boolean) ?? null;
        return { from: piece.start, to: piece.end, odMm: piece.odMm!, colour: colourFor({ selected, severity: sev }, SCENE_COLOURS.pipe) };
      }),
    [pieces, selectedId, severity],
  );

  const markers = useMemo<SphereInstance[]>(
    () =>
      result.components.map((c) => {
        const state = { selected: selectedId === c.nodeId, severity: severity.get(c.nodeId) ?? null };
        // Bends' work points lie off the pipe (where the centrelines cross): keep them small.
        const size = (state.selected ? 1.5 : 1) * (c.kind === 'elbow' || c.kind === 'return' ? markerMm * 0.6 : markerMm);
        return { position: c.position, radiusMm: size, colour: colourFor(state, SCENE_COLOURS.workPoint) };
      }),
    [result, selectedId, severity, markerMm],
  );

  const welds = useMemo<WeldRingInstance[]>(() => {
    const runs = new Map(result.runs.map((r) => [r.runId, r]));
    const od = new Map<string, number>();
    for (const p of result.pieces) if (p.odMm) for (const id of p.runIds) od.set(id, p.odMm);
    // Close-coupled runs have no piece: take the OD from the fitting ends.
    for (const c of result.components) for (const e of c.ends) if (e.runId && e.odMm && !od.has(e.runId)) od.set(e.runId, e.odMm);
    const out: WeldRingInstance[] = [];
    for (const w of result.welds) {
      const run = w.runId ? runs.get(w.runId) : undefined;
      const d = w.runId ? od.get(w.runId) : undefined;
      if (run && d) out.push({ position: w.position, axis: run.direction, odMm: d, colour: w.location === 'field' ? SCENE_COLOURS.warning : SCENE_COLOURS.weld });
    }
    return out;
  }, [result]);

  return (
    <group name="spool">
      <InstancedPipes
        items={pipes}
        onPick={(i, p) => {
          const piece = pieces[i];
          if (!piece) return;
          const mm = { x: p.x / SCENE_UNITS_PER_MM, y: p.y / SCENE_UNITS_PER_MM, z: p.z / SCENE_UNITS_PER_MM };
          const runId = nearestRun(result, piece.runIds, mm);
          if (runId) onSelect({ type: 'run', id: runId });
        }}
      />
      {result.components.map((c) => {
        const state = { selected: selectedId === c.nodeId, severity: severity.get(c.nodeId) ?? null };
        const base = c.shape.type === 'flange' ? SCENE_COLOURS.flange : SCENE_COLOURS.fitting;
        return (
          <group key={c.nodeId} name={`node-${c.nodeId}`}>
            <ComponentMesh
              component={c}
              flange={flanges.get(c.nodeId)}
              colour={colourFor(state, base)}
              onClick={pickHandler(() => onSelect({ type: 'node', id: c.nodeId }))}
            />
          </group>
        );
      })}
      <InstancedSpheres
        items={markers}
        onPick={(i) => {
          const c = result.components[i];
          if (c) onSelect({ type: 'node', id: c.nodeId });
        }}
      />
      <InstancedWeldRings items={welds} />
    </group>
  );
});
