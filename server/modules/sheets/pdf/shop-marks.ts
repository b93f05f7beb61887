import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { componentMarks } from '../../../../shared/engine/component-marks';
import { clockReference } from '../../../../shared/engine/clock-angles';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/**
 * Shop marks for components: the same marks the editor shows (`componentMarks` in
 * shared/engine/component-marks.ts), so paper and screen agree. Users see these, never the
 * design's internal node ids.
 */
export function shopMarks(result: SpoolResult): Map<string, string> {
  return componentMarks(result);
}

const ID_TOKEN = /[A-Za-z0-9_.:-]+/g;

/**
 * Engine text (weld "joins", messages) with node ids replaced by shop marks. Tokens that are
 * already a piece or weld mark are left alone (a node may be called "P3" too).
 */
export function withShopMarks(text: string, marks: Map<string, string>, result: SpoolResult): string {
  const kept = new Set([...result.pieces.map((p) => p.mark), ...result.welds.map((w) => w.mark)]);
  const runs = new Map(result.runs.map((r) => [r.runId, r]));
  return text.replace(ID_TOKEN, (token) => {
    if (kept.has(token)) return token;
    const mark = marks.get(token);
    if (mark) return mark;
    const run = runs.get(token);
    if (run) return run.pieceMark ?? `${marks.get(run.from) ?? '?'}–${marks.get(run.to) ?? '?'}`;
    return token;
  });
}

/**
 * How an outlet's angle round its header is measured, for the sheet: from the top of the pipe
 * on a horizontal or sloping header, from plant north on a vertical one (clockwise, looking
 * along the header's run direction).
 */
export function outletAngleText(angleDeg: number, headerAxis: Vec3): string {
  const ref = clockReference(headerAxis).reference === 'plant-north' ? 'plant N' : 'top of pipe';
  return `${Number(angleDeg.toFixed(1))}° from ${ref}`;
}
