import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { EditorModel } from '../../../../src/features/editor/model/editor-model';
import { startSpool } from '../../../../src/features/editor/model/commands/start-spool';
import { extendRun } from '../../../../src/features/editor/model/commands/extend-run';
import { PLANT_AXES, type PlantAxis } from '../../../../src/features/editor/model/plant-directions';
import type { Nps } from '../../../../shared/standards/nps';
import type { RunLengthKind } from '../../../../shared/schemas/spool-design-run.schema';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/** Millimetre precision for comparing engine lengths with table arithmetic. */
export const MM = 0.01;

/**
 * Tolerance when a check value comes from a different edition of a table than the
 * engine's: ASME B16.5 pre-2003 Y (incl. a 1.6 mm face) against 2003+ Y + 2 mm face
 * differ by up to about 0.4 mm (shared reference §9.3).
 */
export const TABLE_EDITION_MM = 0.5;

/** Asserts |actual − expected| ≤ tol (mm). */
export function expectMm(actual: number | null | undefined, expected: number, tol = MM): void {
  if (actual === null || actual === undefined) throw new Error(`expected ${expected} mm, got ${String(actual)}`);
  if (Math.abs(actual - expected) > tol) throw new Error(`expected ${expected} ± ${tol} mm, got ${actual}`);
}

/** A model on the real engine; root gap 3 mm (the built-in default, common practice). */
export function newModel(design: SpoolDesign | null = null, readOnly = false): EditorModel {
  return new EditorModel((d) => computeSpool(d, { jobSpec: { rootGapMm: 3 } }), { design, readOnly });
}

/** Starts an NPS spool with a weld-neck flange at the origin. */
export function startWithFlange(model: EditorModel, nps: Nps = '6'): void {
  const r = model.apply((_d, ctx) => startSpool({ nps, end: { type: 'weld-neck-flange' } }, ctx.ids));
  if (!r.ok) throw new Error(r.error);
}

/** Extends from the newest open end (or `from`) and fails the test on refusal. */
export function extend(model: EditorModel, to: PlantAxis | Vec3, mm: number, kind?: RunLengthKind, from?: string) {
  const design = model.getSnapshot().design!;
  const fromNodeId = from ?? design.nodes.filter((n) => n.kind === 'end').at(-1)!.id;
  const direction = typeof to === 'string' ? PLANT_AXES[to].vector : to;
  const r = model.edit((d, ctx) => extendRun(d, { fromNodeId, direction, lengthMm: mm, ...(kind ? { lengthKind: kind } : {}) }, ctx));
  if (!r.ok) throw new Error(r.error);
  return r;
}

/** The engine result of the model's design (asserts there is one). */
export function resultOf(model: EditorModel): SpoolResult {
  const r = model.getResult();
  if (!r) throw new Error('no result');
  return r;
}

/** Cut lengths of the pieces in order, mm. */
export function cuts(model: EditorModel): (number | null)[] {
  return resultOf(model).pieces.map((p) => p.cutLengthMm);
}

/** Error-severity issue codes of the model's design. */
export function errors(model: EditorModel): string[] {
  return resultOf(model).issues.filter((i) => i.severity === 'error').map((i) => `${i.code}: ${i.message}`);
}
