import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import {
  cutFromRunLength,
  runLengthAs,
  runLengthFromCut,
} from '../../../shared/engine/run-length-conversion';
import { bevel, design, EAST, elbow, NORTH, run, UP } from './helpers/design-builder';

describe('run length conversion', () => {
  it('round-trips the NPS 6 example: 536 mm cut ↔ 1000 mm centre-to-centre', () => {
    expect(runLengthFromCut(536, 229, 229, 6)).toBe(1000);
    expect(cutFromRunLength(1000, 229, 229, 6)).toBe(536);
    expect(cutFromRunLength(400, 229, 229, 6)).toBeNull();
  });

  it('restating a run as a cut length keeps every position', () => {
    const nodes = [bevel('a'), elbow('e1'), elbow('e2'), bevel('b')];
    const cc = design(
      nodes,
      [run('r1', 'a', 'e1', EAST, 700), run('r2', 'e1', 'e2', NORTH, 1234.5), run('r3', 'e2', 'b', UP, 700)],
      { nps: '10' },
    );
    const first = computeSpool(cc);
    const cut = runLengthAs(
      first.runs.find((r) => r.runId === 'r2')!,
      'cut',
    )!;
    const restated = computeSpool({
      ...cc,
      runs: cc.runs.map((r) => (r.id === 'r2' ? { ...r, length: { mm: cut, kind: 'cut' as const } } : r)),
    });
    expect(restated.workPoints).toEqual(first.workPoints);
  });
});
