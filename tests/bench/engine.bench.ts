import { readdirSync, readFileSync } from 'node:fs';
import { bench, describe } from 'vitest';
import { computeSpool } from '../../shared/engine/compute-spool';
import type { SpoolDesign } from '../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../shared/schemas/spool-design-node.schema';
import type { SpoolRun } from '../../shared/schemas/spool-design-run.schema';
import { spoolDesignSchema } from '../../shared/schemas/spool-design.schema';

/**
 * A 200-component 10" spool: a 3D staircase of LR 90° elbows with a 4" set-on branch and
 * weld neck every eighth run. Deterministic, so runs compare.
 */
function bigSpool(components: number): SpoolDesign {
  const dirs = [
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
    { x: 0, y: 0, z: 1 },
  ];
  const nodes: SpoolNode[] = [{ id: 'f0', kind: 'end', end: { type: 'weld-neck-flange' } }];
  const runs: SpoolRun[] = [];
  let prev = 'f0';
  let i = 0;
  while (nodes.length < components - 1) {
    const dir = dirs[i % 3]!;
    if (i % 8 === 3 && nodes.length < components - 3) {
      const b = `b${i}`;
      const bf = `bf${i}`;
      const side = dirs[(i + 1) % 3]!;
      nodes.push(
        { id: b, kind: 'set-on-branch' },
        { id: bf, kind: 'end', end: { type: 'weld-neck-flange' } },
      );
      runs.push({
        id: `ra${i}`,
        from: prev,
        to: b,
        direction: dir,
        length: { mm: 1200, kind: 'centre-to-centre' },
      });
      runs.push({
        id: `rb${i}`,
        from: b,
        to: bf,
        direction: side,
        length: { mm: 700, kind: 'centre-to-face' },
        nps: '4',
      });
      prev = b;
    }
    const e = `e${i}`;
    nodes.push({ id: e, kind: 'elbow' });
    runs.push({
      id: `r${i}`,
      from: prev,
      to: e,
      direction: dir,
      length: { mm: 1500, kind: 'centre-to-centre' },
    });
    prev = e;
    i++;
  }
  nodes.push({ id: 'fEnd', kind: 'end', end: { type: 'weld-neck-flange' } });
  runs.push({
    id: 'rEnd',
    from: prev,
    to: 'fEnd',
    direction: dirs[i % 3]!,
    length: { mm: 1500, kind: 'centre-to-face' },
  });
  return {
    format: 'tackline.spool',
    version: 1,
    spec: { nps: '10' },
    origin: { x: 0, y: 0, z: 0 },
    nodes,
    runs,
  };
}

const big = bigSpool(200);
const bigParsed = spoolDesignSchema.parse(big);
const samples = readdirSync('samples')
  .filter((f) => f.endsWith('.json'))
  .map((f) => JSON.parse(readFileSync(`samples/${f}`, 'utf8')) as unknown);
const job = Array.from({ length: 500 }, (_, k) => samples[k % samples.length]!);

// Sanity outside the timed loop: the generated spool computes cleanly.
const check = computeSpool(big);
if (!check.ok || check.components.length !== 200) {
  throw new Error(
    `bench spool is not clean: ${check.components.length} components, ${JSON.stringify(check.issues.slice(0, 3))}`,
  );
}

// Warm up first: the editor recomputes a design many times, so steady state is what counts.
const OPTIONS = { time: 3000, warmupTime: 1000, warmupIterations: 20 };

describe('computeSpool', () => {
  bench(
    '200-component spool (validated)',
    () => {
      computeSpool(big);
    },
    OPTIONS,
  );
  bench(
    '200-component spool (trusted, already validated)',
    () => {
      computeSpool(bigParsed, { trusted: true });
    },
    OPTIONS,
  );
  bench(
    '200-component spool (trusted, unrounded: the editor path)',
    () => {
      computeSpool(bigParsed, { trusted: true, round: false });
    },
    OPTIONS,
  );
  bench(
    '500-spool job (the samples, cycled)',
    () => {
      for (const d of job) computeSpool(d);
    },
    OPTIONS,
  );
});
