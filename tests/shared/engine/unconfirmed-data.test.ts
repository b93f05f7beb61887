import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { SpoolNode } from '../../../shared/schemas/spool-design-node.schema';
import { bevel, design, EAST, elbow, NORTH, run, WEST, wn } from './helpers/design-builder';

const reducer = (id: string, toNps: string): SpoolNode => ({ id, kind: 'reducer', toNps }) as SpoolNode;

const unconfirmed = (r: ReturnType<typeof computeSpool>) =>
  r.issues.filter((i) => i.code === 'standard-data-unconfirmed');

describe('results resting on standards values from memory', () => {
  it('warns once for an NPS 12 reducer, whose H = 203 mm is from memory (reference file §2: "203 (8.00) M")', () => {
    const r = computeSpool(
      design(
        [bevel('a'), reducer('r1', '10'), bevel('b')],
        [
          run('p1', 'a', 'r1', EAST, 600, 'centre-to-face'),
          run('p2', 'r1', 'b', EAST, 600, 'centre-to-face'),
        ],
        { nps: '12' },
      ),
    );
    const w = unconfirmed(r);
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('warning');
    expect(w[0]!.componentId).toBe('r1');
    expect(w[0]!.message).toContain('NPS 12 reducer length H = 203 mm');
    expect(w[0]!.message).toContain('ASME B16.9');
    expect(w[0]!.message).toContain('confirm before cutting');
    // The value is still used: the take-off is H / 2.
    expect(r.runs.find((x) => x.runId === 'p1')!.takeOffToMm).toBe(101.5);
    expect(r.ok).toBe(true);
  });

  it('gives one warning per distinct value, naming every component that used it', () => {
    // Two 12 × 10 reducers, one on each leg of an NPS 12 elbow.
    const r = computeSpool(
      design(
        [elbow('e0'), reducer('r1', '10'), bevel('a'), reducer('r2', '10'), bevel('b')],
        [
          run('p1', 'e0', 'r1', WEST, 800),
          run('p2', 'r1', 'a', WEST, 600, 'centre-to-face'),
          run('p3', 'e0', 'r2', NORTH, 800),
          run('p4', 'r2', 'b', NORTH, 600, 'centre-to-face'),
        ],
        { nps: '12' },
      ),
    );
    expect(r.ok).toBe(true);
    const w = unconfirmed(r);
    expect(w).toHaveLength(1);
    expect(w[0]!.componentId).toBe('r1');
    expect(w[0]!.message).toContain('(used by r1, r2)');
  });

  it('flags an XS wall above NPS 10 (from memory in shared/standards) on the run that uses it', () => {
    const r = computeSpool(
      design([bevel('a'), bevel('b')], [run('p1', 'a', 'b', EAST, 1000, 'cut')], {
        nps: '14',
        schedule: 'XS',
      }),
    );
    const w = unconfirmed(r);
    expect(w).toHaveLength(1);
    expect(w[0]!.componentId).toBe('p1');
    expect(w[0]!.message).toContain('NPS 14 XS pipe wall = 12.7 mm');
    expect(w[0]!.message).toContain('ASME B36.10M');
  });

  it('says nothing for a design on sourced values only', () => {
    // NPS 6 STD wall 7.11 mm (B36.10M, S), LR 90° A = 229 mm (B16.9, S), Class 150 drilling
    // (B16.5-2009 Table 7, S; tf and Y computed, C): reference file §§1–3.
    const r = computeSpool(
      design(
        [wn('f1'), elbow('e1'), wn('f2')],
        [
          run('p1', 'f1', 'e1', EAST, 1000, 'centre-to-face'),
          run('p2', 'e1', 'f2', NORTH, 1000, 'centre-to-face'),
        ],
        { nps: '6' },
      ),
    );
    expect(r.ok).toBe(true);
    expect(r.runs[0]!.takeOffToMm).toBe(229);
    expect(unconfirmed(r)).toEqual([]);
  });

  it('flags the NPS 4 LR 45° B = 64 mm (sources give 63.0 / 63.5 / 64: reference file §2)', () => {
    const d45 = { x: Math.SQRT1_2, y: Math.SQRT1_2, z: 0 };
    const r = computeSpool(
      design(
        [bevel('a'), elbow('e1'), bevel('b')],
        [run('p1', 'a', 'e1', EAST, 500, 'centre-to-face'), run('p2', 'e1', 'b', d45, 500, 'centre-to-face')],
        { nps: '4' },
      ),
    );
    const w = unconfirmed(r);
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toContain('NPS 4 long-radius 45° elbow B = 64 mm');
    expect(w[0]!.componentId).toBe('e1');
  });
});
