import { describe, expect, it } from 'vitest';
import { extendRun } from '../../../../src/features/editor/model/commands/extend-run';
import { cuts, errors, expectMm, extend, newModel, resultOf, startWithFlange, MM, TABLE_EDITION_MM } from './editor-test-kit';

// Reference values (shared reference table, status S unless noted):
// ASME B16.9 LR 90° elbow A: NPS 6 = 229 mm, NPS 14 = 533 mm (21 in; not in the shared table, from memory).
// ASME B16.9 LR 45° elbow B: NPS 6 = 95 mm.
// ASME B16.5 Class 150 weld-neck length through hub Y incl. 1.6 mm raised face (pre-2003 tables): NPS 6 = 88.9 mm
// (S); the engine uses the 2003+ Y (87, from memory) + 2 mm face = 89, hence TABLE_EDITION_MM.
// Root gap 3 mm per butt weld (common practice; configurable).
const A6 = 229;
const B6 = 95;
const Y6 = 88.9;
const GAP = 3;

describe('extendRun', () => {
  it('grows the first run from the start flange to a bevelled open end', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const d = m.getSnapshot().design!;
    expect(d.runs).toHaveLength(1);
    expect(d.runs[0]!.length).toEqual({ mm: 1000, kind: 'centre-to-face' });
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'end']);
    // flange face to bevel: one butt weld at the flange (ASME B16.5 Y + one gap)
    expectMm(cuts(m)[0], 1000 - Y6 - GAP, TABLE_EDITION_MM);
    expect(m.getSnapshot().selection).toEqual({ type: 'node', id: d.nodes[1]!.id });
  });

  it('turns the old tip into an elbow when the line changes direction, keeping the tip component at the new end', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    extend(m, 'north', 800);
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'elbow', 'end']);
    expect(d.runs[0]!.length.kind).toBe('centre-to-face');
    expect(d.runs[1]!.length.kind).toBe('centre-to-centre');
    expect(resultOf(m).issues).toEqual([]);
    // P1: flange face to elbow centre 1000 − Y (88.9) − A (229) − two gaps
    expectMm(cuts(m)[0], 1000 - Y6 - A6 - 2 * GAP, TABLE_EDITION_MM);
    // P2: elbow centre to bevel end 800 − A − one gap
    expect(cuts(m)[1]).toBeCloseTo(800 - A6 - GAP, 1);
    expect(errors(m)).toEqual([]);
  });

  it('refuses to extend along the run, straight back, or through more than 90°', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const before = m.getSnapshot().design;
    const tip = before!.nodes[1]!.id;
    for (const direction of [{ x: 1, y: 0, z: 0 }, { x: -1, y: 0, z: 0 }, { x: -1, y: 1, z: 0 }]) {
      const r = m.edit((d, ctx) => extendRun(d, { fromNodeId: tip, direction, lengthMm: 500 }, ctx));
      expect(r.ok).toBe(false);
    }
    expect(m.getSnapshot().design).toBe(before);
    expect(m.getSnapshot().lastError).toMatch(/90°/);
  });

  it('refuses zero, negative and non-numeric lengths, but takes a cut length of 0', () => {
    const m = newModel();
    startWithFlange(m);
    const tip = m.getSnapshot().design!.nodes[0]!.id;
    for (const lengthMm of [0, -5, Number.NaN]) {
      const r = m.edit((d, ctx) => extendRun(d, { fromNodeId: tip, direction: { x: 1, y: 0, z: 0 }, lengthMm }, ctx));
      expect(r.ok).toBe(false);
    }
    extend(m, 'east', 1000);
    extend(m, 'north', 0, 'cut');
    expect(m.getSnapshot().design!.runs[1]!.length).toEqual({ mm: 0, kind: 'cut' });
  });

  it('builds a two-elbow return: close-coupled elbows sit 2A + one gap apart', () => {
    // Trade brief: two 90° elbows welded into a 180° return: centre-to-centre = 2A + gap.
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1500);
    extend(m, 'north', 0, 'cut');
    extend(m, 'west', 1500);
    const r = resultOf(m);
    const between = r.runs.find((x) => x.runId === m.getSnapshot().design!.runs[1]!.id)!;
    expect(between.closeCoupled).toBe(true);
    expect(between.workPointDistanceMm).toBeCloseTo(2 * A6 + GAP, 1);
    expect(r.pieces).toHaveLength(2);
    expect(errors(m)).toEqual([]);
  });

  it('extends from the start end by adding a run before it (the tip becomes the new root)', () => {
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const start = m.getSnapshot().design!.nodes[0]!.id;
    extend(m, 'down', 600, undefined, start);
    const d = m.getSnapshot().design!;
    const newRoot = d.nodes.find((n) => !d.runs.some((r) => r.to === n.id))!;
    expect(newRoot.kind).toBe('end');
    expect(newRoot.kind === 'end' && newRoot.end.type).toBe('weld-neck-flange');
    expect(d.nodes.find((n) => n.id === start)!.kind).toBe('elbow');
    // the flange moved to the new root, 600 below the old start: 600 − Y − A − 2 gaps
    expectMm(cuts(m)[0], 600 - Y6 - A6 - 2 * GAP, TABLE_EDITION_MM);
    expect(errors(m)).toEqual([]);
  });

  it('lays a rolling offset with two 45° elbows: travel = 1.414 × true offset', () => {
    // Fitter's rule (shared reference §7): rolling offset true offset = √(set² + roll²),
    // travel = true offset × 1.414 for 45° fittings. Set 300 north, roll 400 up → true offset 500.
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const travel = 500 * Math.SQRT2;
    extend(m, { x: 500, y: 300, z: 400 }, travel);
    extend(m, 'east', 800);
    const r = resultOf(m);
    const elbows = r.components.filter((c) => c.kind === 'elbow');
    expect(elbows.map((e) => (e.shape.type === 'elbow' ? e.shape.angleDeg : 0))).toEqual([45, 45].map((x) => expect.closeTo(x, 3)));
    // piece between the elbows: travel − 2 × B (95, ASME B16.9 LR 45° NPS 6) − 2 gaps
    expect(r.pieces[1]!.cutLengthMm).toBeCloseTo(travel - 2 * B6 - 2 * GAP, 1);
    // the line ends 300 north and 400 up of where it started
    const end = r.openEnds.find((o) => o.nodeId === m.getSnapshot().design!.nodes.at(-1)!.id)!;
    expect(end.facePoint.y).toBeCloseTo(300, 3);
    expect(end.facePoint.z).toBeCloseTo(400, 3);
    expect(errors(m)).toEqual([]);
  });

  it('turns at an angle no table lists with an elbow cut to R·tan(θ/2)', () => {
    // Trade brief / fitting maker's worked example: cut elbow take-off = R·tan(θ/2), R = 1.5 × NPS (LR).
    const m = newModel();
    startWithFlange(m);
    extend(m, 'east', 1000);
    const theta = 60;
    const rad = (theta * Math.PI) / 180;
    extend(m, { x: Math.cos(rad), y: Math.sin(rad), z: 0 }, 1000);
    const r = resultOf(m);
    const elbow = r.components.find((c) => c.kind === 'elbow')!;
    const R = 1.5 * 6 * 25.4;
    expect(elbow.ends[0]!.takeOffMm).toBeCloseTo(R * Math.tan(rad / 2), 0);
    expect(Math.abs((elbow.ends[0]!.takeOffMm ?? 0) - R * Math.tan(rad / 2))).toBeLessThan(1 + MM);
  });
});

describe('extendRun with a 180° return', () => {
  it('turns straight back through a return stepping to the chosen side: legs O apart', () => {
    // ASME B16.9 LR 180° return centre-to-centre O, NPS 6 = 457 mm (shared reference §2, S; tolerance ±6 mm).
    const m = newModel();
    startWithFlange(m, '6');
    extend(m, 'east', 1500);
    const tip = m.getSnapshot().design!.nodes.at(-1)!.id;
    const side = { x: 0, y: 1, z: 0 };
    const wrongSide = m.edit((d, ctx) => extendRun(d, { fromNodeId: tip, direction: { x: -1, y: 0, z: 0 }, lengthMm: 1500, returnSide: { x: 1, y: 1, z: 0 } }, ctx));
    expect(wrongSide.ok).toBe(false);
    const r = m.edit((d, ctx) => extendRun(d, { fromNodeId: tip, direction: { x: -1, y: 0, z: 0 }, lengthMm: 1500, returnSide: side }, ctx));
    expect(r.ok).toBe(true);
    const d = m.getSnapshot().design!;
    expect(d.nodes.map((n) => n.kind)).toEqual(['end', 'return', 'end']);
    const res = resultOf(m);
    expect(errors(m)).toEqual([]);
    const end = res.openEnds.find((o) => o.nodeId === d.nodes[2]!.id)!;
    expect(Math.abs(end.facePoint.y - 457)).toBeLessThanOrEqual(6);
    expect(end.facePoint.x).toBeCloseTo(0, 3);
  });
});
