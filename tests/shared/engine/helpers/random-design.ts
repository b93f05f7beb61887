import fc from 'fast-check';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import type { Nps } from '../../../../shared/standards/nps';
import { anyPerpendicular, normalise, rotateAbout } from '../../../../shared/engine/vec3-math';

const DEG = Math.PI / 180;

type Segment = { angle: number; roll: number; mm: number; kind: 'centre-to-centre' | 'cut' };

/** Parameters of a random valid chain spool (optionally with one set-on branch). */
export type ChainParams = {
  nps: Nps;
  branchNps: Nps | null;
  /** A reducer in the middle of the last run, to this size. */
  reducer: { toNps: Nps; eccentric: boolean } | null;
  azimuth: number;
  elevation: number;
  segments: Segment[];
  ends: ['weld-neck-flange' | 'bevel', 'weld-neck-flange' | 'bevel'];
  rootGapMm: number;
  origin: Vec3;
};

const SIZES = ['4', '6', '10', '14'] as const;
const BRANCHES: Record<(typeof SIZES)[number], Nps[]> = {
  '4': ['2', '4'],
  '6': ['2', '4', '6'],
  '10': ['4', '6'],
  '14': ['6', '10'],
};

// Reducer combinations with ASME B16.9 data in shared/standards.
const REDUCED: Record<(typeof SIZES)[number], Nps[]> = {
  '4': ['2'],
  '6': ['4'],
  '10': ['4', '6'],
  '14': ['6', '10'],
};

/** Arbitrary valid chain parameters: lengths long enough for every take-off. */
export const chainParams: fc.Arbitrary<ChainParams> = fc.constantFrom(...SIZES).chain((nps) =>
  fc.record({
    nps: fc.constant(nps as Nps),
    branchNps: fc.option(fc.constantFrom(...BRANCHES[nps]), { nil: null }),
    reducer: fc.option(fc.record({ toNps: fc.constantFrom(...REDUCED[nps]), eccentric: fc.boolean() }), {
      nil: null,
    }),
    azimuth: fc.double({ min: 0, max: 360, noNaN: true }),
    elevation: fc.double({ min: -60, max: 60, noNaN: true }),
    segments: fc.array(
      fc.record({
        angle: fc.oneof(fc.constant(90), fc.constant(45), fc.double({ min: 10, max: 89, noNaN: true })),
        roll: fc.double({ min: 0, max: 360, noNaN: true }),
        mm: fc.double({ min: 2200, max: 6000, noNaN: true }),
        kind: fc.constantFrom('centre-to-centre' as const, 'cut' as const),
      }),
      { minLength: 1, maxLength: 7 },
    ),
    ends: fc.tuple(
      fc.constantFrom('weld-neck-flange' as const, 'bevel' as const),
      fc.constantFrom('weld-neck-flange' as const, 'bevel' as const),
    ),
    rootGapMm: fc.double({ min: 0, max: 4, noNaN: true }),
    origin: fc.record({
      x: fc.double({ min: -1e5, max: 1e5, noNaN: true }),
      y: fc.double({ min: -1e5, max: 1e5, noNaN: true }),
      z: fc.double({ min: -1e4, max: 1e4, noNaN: true }),
    }),
  }),
);

function endNode(id: string, type: 'weld-neck-flange' | 'bevel'): SpoolNode {
  return type === 'bevel'
    ? { id, kind: 'end', end: { type: 'bevel' } }
    : { id, kind: 'end', end: { type: 'weld-neck-flange' } };
}

/** Builds the design: a chain of elbows (the first segment's angle is unused), ends at both sides. */
export function chainDesign(p: ChainParams): SpoolDesign {
  let dir: Vec3 = {
    x: Math.cos(p.elevation * DEG) * Math.cos(p.azimuth * DEG),
    y: Math.cos(p.elevation * DEG) * Math.sin(p.azimuth * DEG),
    z: Math.sin(p.elevation * DEG),
  };
  const nodes: SpoolNode[] = [endNode('n0', p.ends[0])];
  const runs: SpoolRun[] = [];
  let prev = 'n0';
  p.segments.forEach((s, i) => {
    if (i > 0) {
      const axis = rotateAbout(anyPerpendicular(dir), dir, s.roll * DEG);
      dir = normalise(rotateAbout(dir, axis, s.angle * DEG))!;
    }
    const last = i === p.segments.length - 1;
    const to = last ? 'nEnd' : `e${i + 1}`;
    nodes.push(last ? endNode('nEnd', p.ends[1]) : { id: to, kind: 'elbow', radius: 'long' });
    const length =
      s.kind === 'cut'
        ? { mm: s.mm / 2, kind: 'cut' as const }
        : { mm: s.mm, kind: 'centre-to-centre' as const };
    if (i === 0 && p.branchNps && s.kind === 'centre-to-centre') {
      // A set-on branch halfway along the first run, square to it, to its own weld neck.
      nodes.push(
        { id: 'b1', kind: 'set-on-branch' },
        { id: 'bf', kind: 'end', end: { type: 'weld-neck-flange' } },
      );
      runs.push({
        id: 'r0a',
        from: prev,
        to: 'b1',
        direction: dir,
        length: { mm: s.mm / 2, kind: 'centre-to-centre' },
      });
      runs.push({
        id: 'r0b',
        from: 'b1',
        to,
        direction: dir,
        length: { mm: s.mm / 2, kind: 'centre-to-centre' },
      });
      const bdir = rotateAbout(anyPerpendicular(dir), dir, s.roll * DEG);
      runs.push({
        id: 'rb',
        from: 'b1',
        to: 'bf',
        direction: bdir,
        length: { mm: 900, kind: 'centre-to-face' },
        nps: p.branchNps,
      });
    } else if (last && p.reducer && s.kind === 'centre-to-centre' && p.segments.length > 1) {
      // A reducer halfway along the last run (eccentric ones offset the small end's axis;
      // "flat on top" needs a run that is not vertical).
      const toNps = p.reducer.toNps;
      const eccentric = p.reducer.eccentric && Math.abs(dir.z) < 0.9;
      nodes.push({
        id: 'x1',
        kind: 'reducer',
        toNps,
        ...(eccentric ? { type: 'eccentric' as const, flatSide: 'top' as const } : {}),
      });
      runs.push({
        id: `r${i}a`,
        from: prev,
        to: 'x1',
        direction: dir,
        length: { mm: s.mm / 2, kind: 'centre-to-centre' },
      });
      runs.push({
        id: `r${i}b`,
        from: 'x1',
        to,
        direction: dir,
        length: { mm: s.mm / 2, kind: 'centre-to-centre' },
      });
    } else {
      runs.push({ id: `r${i}`, from: prev, to, direction: dir, length });
    }
    prev = to;
  });
  return {
    format: 'tackline.spool',
    version: 1,
    spec: { nps: p.nps, rootGapMm: p.rootGapMm },
    origin: p.origin,
    nodes,
    runs,
  };
}

/** Every number in a value (deep), with its path. */
export function numbersIn(v: unknown, path = ''): [string, number][] {
  if (typeof v === 'number') return [[path, v]];
  if (Array.isArray(v)) return v.flatMap((x, i) => numbersIn(x, `${path}.${i}`));
  if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => numbersIn(x, `${path}.${k}`));
  return [];
}
