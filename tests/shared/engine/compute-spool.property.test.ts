import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { SpoolDesign } from '../../../shared/schemas/spool-design.schema';
import type { Vec3 } from '../../../shared/schemas/spool-design-primitives.schema';
import { chainDesign, chainParams, numbersIn } from './helpers/random-design';

const PRECISION_MM = 2e-3; // results are rounded to 1e-4; a few roundings add up

function rotateZ(v: Vec3, deg: number): Vec3 {
  const a = (deg * Math.PI) / 180;
  return { x: v.x * Math.cos(a) - v.y * Math.sin(a), y: v.x * Math.sin(a) + v.y * Math.cos(a), z: v.z };
}

function moved(d: SpoolDesign, t: Vec3, deg: number): SpoolDesign {
  return {
    ...d,
    origin: { x: d.origin.x + t.x, y: d.origin.y + t.y, z: d.origin.z + t.z },
    runs: d.runs.map((r) => ({ ...r, direction: rotateZ(r.direction, deg) })),
  };
}

const LENGTH_KEYS = /(LengthMm|DistanceMm|cutLengthMm|stockLengthMm|totalCutMm|totalStockMm)$/;

describe('computeSpool on random valid designs', () => {
  it('work-point distance = pipe length + take-offs + gaps on every run, and matches the placed ends', () => {
    fc.assert(
      fc.property(chainParams, (p) => {
        const r = computeSpool(chainDesign(p));
        expect(r.issues.filter((i) => i.severity === 'error')).toEqual([]);
        for (const run of r.runs) {
          expect(run.pipeLengthMm).not.toBeNull();
          const sum = run.pipeLengthMm! + run.takeOffFromMm! + run.takeOffToMm! + run.gapsMm;
          expect(Math.abs(run.workPointDistanceMm - sum)).toBeLessThan(PRECISION_MM);
          const placed = Math.hypot(
            run.end.x - run.start.x,
            run.end.y - run.start.y,
            run.end.z - run.start.z,
          );
          expect(Math.abs(placed - run.workPointDistanceMm)).toBeLessThan(PRECISION_MM * 10);
        }
        // A stated cut length comes back as the piece's cut length.
        for (const run of r.runs.filter((x) => x.lengthKind === 'cut')) {
          expect(run.pipeLengthMm).toBeCloseTo(run.statedMm, 3);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('gives the same cut lengths, welds and weights after moving the spool and turning it about the vertical', () => {
    fc.assert(
      fc.property(
        chainParams,
        fc.record({
          x: fc.double({ min: -5e4, max: 5e4, noNaN: true }),
          y: fc.double({ min: -5e4, max: 5e4, noNaN: true }),
          z: fc.double({ min: -5e3, max: 5e3, noNaN: true }),
        }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        (p, t, deg) => {
          const d = chainDesign(p);
          const a = computeSpool(d);
          const b = computeSpool(moved(d, t, deg));
          expect(b.pieces.map((x) => x.mark)).toEqual(a.pieces.map((x) => x.mark));
          a.pieces.forEach((pa, i) => expect(b.pieces[i]!.cutLengthMm!).toBeCloseTo(pa.cutLengthMm!, 2));
          expect(b.welds.map((w) => [w.type, w.nps, w.location])).toEqual(
            a.welds.map((w) => [w.type, w.nps, w.location]),
          );
          expect(b.diameterInches).toBe(a.diameterInches);
          expect(b.weights.emptyKg).toBeCloseTo(a.weights.emptyKg, 2);
          expect(b.weights.waterFilledKg).toBeCloseTo(a.weights.waterFilledKg, 2);
          // The centre of gravity moves with the spool.
          const ca = a.weights.centreOfGravity!;
          const rel = rotateZ({ x: ca.x - d.origin.x, y: ca.y - d.origin.y, z: ca.z - d.origin.z }, deg);
          const cb = b.weights.centreOfGravity!;
          const o = { x: d.origin.x + t.x, y: d.origin.y + t.y, z: d.origin.z + t.z };
          expect(cb.x - o.x).toBeCloseTo(rel.x, 1);
          expect(cb.y - o.y).toBeCloseTo(rel.y, 1);
          expect(cb.z - o.z).toBeCloseTo(rel.z, 1);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('computeSpool on bad input', () => {
  const assertSane = (r: ReturnType<typeof computeSpool>) => {
    for (const [path, n] of numbersIn(r)) {
      expect(Number.isFinite(n), path).toBe(true);
      if (LENGTH_KEYS.test(path)) expect(n, path).toBeGreaterThanOrEqual(0);
    }
    expect(r.issues.some((i) => i.code === 'internal-error')).toBe(false);
  };

  it('never throws on arbitrary values and reports them as invalid designs', () => {
    fc.assert(
      fc.property(fc.anything(), (v) => {
        const r = computeSpool(v);
        expect(r.ok).toBe(false);
        expect(r.issues.length).toBeGreaterThan(0);
        assertSane(r);
      }),
      { numRuns: 200 },
    );
  });

  // Random graphs of random components: mostly nonsense, always answered with issues.
  const nodeArb = (id: string) =>
    fc.oneof(
      fc.constant({ id, kind: 'end', end: { type: 'weld-neck-flange' } }),
      fc.constant({ id, kind: 'end', end: { type: 'bevel' } }),
      fc.constant({ id, kind: 'end', end: { type: 'cap' } }),
      fc.constant({ id, kind: 'elbow', construction: 'mitre', mitreWelds: 3 }),
      fc.constant({ id, kind: 'elbow', radius: 'short' }),
      fc.record({
        id: fc.constant(id),
        kind: fc.constant('return'),
        offsetDirection: fc.constant({ x: 0, y: 0, z: 1 }),
      }),
      fc.constant({ id, kind: 'tee', branchNps: '4' }),
      fc.constant({ id, kind: 'set-on-branch' }),
      fc.constant({ id, kind: 'half-coupling', branchNps: '1', orientationDeg: 45 }),
      fc.constant({ id, kind: 'branch-outlet', branchNps: '2', outletEnd: 'socket', heightMm: 40 }),
      fc.constant({ id, kind: 'reducer', toNps: '4', type: 'eccentric' }),
      fc.constant({ id, kind: 'socket-fitting' }),
    );
  const dirArb = fc.oneof(
    fc.constantFrom(
      { x: 1, y: 0, z: 0 },
      { x: 0, y: 1, z: 0 },
      { x: 0, y: 0, z: -1 },
      { x: -1, y: 0, z: 0 },
      { x: 1, y: 1, z: 0 },
    ),
    fc.record({
      x: fc.double({ min: -1, max: 1, noNaN: true }),
      y: fc.double({ min: -1, max: 1, noNaN: true }),
      z: fc.constant(0.5),
    }),
  );
  const graphArb = fc.integer({ min: 1, max: 9 }).chain((n) =>
    fc.record({
      nodes: fc.tuple(...Array.from({ length: n }, (_, i) => nodeArb(`n${i}`))),
      runs: fc.array(
        fc.record({
          from: fc.integer({ min: 0, max: n - 1 }),
          to: fc.integer({ min: 0, max: n - 1 }),
          direction: dirArb,
          mm: fc.double({ min: 0, max: 5000, noNaN: true }),
          kind: fc.constantFrom('centre-to-centre', 'centre-to-face', 'face-to-face', 'cut'),
          nps: fc.option(fc.constantFrom('1', '2', '4', '6', '24'), { nil: undefined }),
        }),
        { maxLength: 10 },
      ),
      nps: fc.constantFrom('1', '2', '4', '6', '10', '14'),
    }),
  );

  it('never throws, never gives NaN or a negative length on random graphs of random components', () => {
    fc.assert(
      fc.property(graphArb, (g) => {
        const d = {
          format: 'tackline.spool',
          version: 1,
          spec: { nps: g.nps },
          origin: { x: 0, y: 0, z: 0 },
          nodes: g.nodes,
          runs: g.runs.map((r, i) => ({
            id: `r${i}`,
            from: `n${r.from}`,
            to: `n${r.to}`,
            direction: r.direction,
            length: { mm: r.mm, kind: r.kind },
            ...(r.nps ? { nps: r.nps } : {}),
          })),
        };
        const r = computeSpool(d);
        assertSane(r);
        // The shapes are valid: what is wrong is geometry, reported as engine issues.
        expect(r.issues.some((i) => i.code === 'invalid-design')).toBe(false);
        if (!r.ok) expect(r.issues.some((i) => i.severity === 'error')).toBe(true);
      }),
      { numRuns: 400 },
    );
  });

  type Mutation = (d: SpoolDesign, pick: number) => SpoolDesign;
  const mutations: [string, Mutation][] = [
    ['drop a run', (d, k) => ({ ...d, runs: d.runs.filter((_, i) => i !== k % d.runs.length) })],
    [
      'point a run at a missing node',
      (d, k) => ({
        ...d,
        runs: d.runs.map((r, i) => (i === k % d.runs.length ? { ...r, to: 'nowhere' } : r)),
      }),
    ],
    [
      'make a run too short for its fittings',
      (d, k) => ({
        ...d,
        runs: d.runs.map((r, i) =>
          i === k % d.runs.length ? { ...r, length: { mm: 1, kind: 'centre-to-centre' as const } } : r,
        ),
      }),
    ],
    [
      'fold a run back on itself (180° at an elbow)',
      (d, k) => {
        const out = d.runs.filter((r) => r.from.startsWith('e'));
        if (out.length === 0)
          return {
            ...d,
            runs: d.runs.map((r) => ({ ...r, direction: { x: 0, y: 0, z: 1 } })),
            nodes: [...d.nodes, { id: 'e9', kind: 'elbow' }],
          };
        const target = out[k % out.length]!;
        const prev = d.runs.find((r) => r.to === target.from)!.direction;
        return {
          ...d,
          runs: d.runs.map((r) =>
            r === target ? { ...r, direction: { x: -prev.x, y: -prev.y, z: -prev.z } } : r,
          ),
        };
      },
    ],
    [
      'add a loop',
      (d) => ({
        ...d,
        runs: [
          ...d.runs,
          { ...d.runs[0]!, id: 'loop', from: d.runs[d.runs.length - 1]!.to, to: d.runs[0]!.to },
        ],
      }),
    ],
    [
      'put socket-weld caps on a 14" line (no B16.11 data above NPS 2)',
      (d) => ({
        ...d,
        spec: { ...d.spec, nps: '14' as const },
        nodes: d.nodes.map((n) =>
          n.id === 'n0' || n.id === 'nEnd'
            ? { id: n.id, kind: 'end' as const, end: { type: 'socket-cap' as const } }
            : n,
        ),
      }),
    ],
  ];

  it.each(mutations)('reports an error, never a throw or NaN, when we %s', (_name, mutate) => {
    fc.assert(
      fc.property(chainParams, fc.nat(), (p, k) => {
        const r = computeSpool(mutate(chainDesign(p), k));
        expect(r.ok).toBe(false);
        expect(r.issues.some((i) => i.severity === 'error')).toBe(true);
        assertSane(r);
      }),
      { numRuns: 60 },
    );
  });
});
