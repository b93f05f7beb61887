import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { spoolDesignSchema } from '../../../shared/schemas/spool-design.schema';

const SAMPLES = readdirSync('samples').filter((f) => f.endsWith('.json'));
const load = (f: string) => JSON.parse(readFileSync(`samples/${f}`, 'utf8')) as Record<string, unknown>;
const paths = (v: unknown) => {
  const r = spoolDesignSchema.safeParse(v);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

describe('spoolDesignSchema', () => {
  it('has samples to check', () => {
    expect(SAMPLES.length).toBeGreaterThanOrEqual(3);
  });

  it.each(SAMPLES)('accepts the sample %s', (f) => {
    const r = spoolDesignSchema.safeParse(load(f));
    expect(r.success ? [] : r.error.issues).toEqual([]);
  });

  const base = load('cw-201-s03-return-14in.json');
  const withNode = (i: number, patch: Record<string, unknown>) => ({
    ...base,
    nodes: (base.nodes as Record<string, unknown>[]).map((n, j) => (j === i ? { ...n, ...patch } : n)),
  });
  const withRun = (i: number, patch: Record<string, unknown>) => ({
    ...base,
    runs: (base.runs as Record<string, unknown>[]).map((r, j) => (j === i ? { ...r, ...patch } : r)),
  });

  it.each([
    ['a wrong format name', { ...base, format: 'spool' }, 'format'],
    ['a future version', { ...base, version: 2 }, 'version'],
    ['a missing origin coordinate', { ...base, origin: { x: 0, y: 0 } }, 'origin.z'],
    ['an unknown end type', withNode(0, { end: { type: 'flange' } }), 'nodes.0.end.type'],
    ['an unknown node kind', withNode(1, { kind: 'wye' }), 'nodes.1.kind'],
    ['an unknown NPS', withRun(4, { nps: '7' }), 'runs.4.nps'],
    ['a negative length', withRun(0, { length: { mm: -5, kind: 'cut' } }), 'runs.0.length.mm'],
    ['an unknown length kind', withRun(0, { length: { mm: 5, kind: 'end-to-end' } }), 'runs.0.length.kind'],
    ['a zero direction', withRun(1, { direction: { x: 0, y: 0, z: 0 } }), 'runs.1.direction'],
    [
      'a NaN-like string coordinate',
      withRun(1, { direction: { x: 'NaN', y: 0, z: 0 } }),
      'runs.1.direction.x',
    ],
    ['an unknown property', withRun(1, { colour: 'red' }), 'runs.1'],
    [
      'a flange class the tables do not carry',
      withNode(0, { end: { type: 'weld-neck-flange', flangeClass: 900 } }),
      'nodes.0.end.flangeClass',
    ],
    ['a duplicate node id', withNode(2, { id: 'F1' }), 'nodes.2.id'],
    ['a run reusing a node id', withRun(0, { id: 'F1' }), 'runs.0.id'],
    ['an id with spaces', withNode(0, { id: 'flange one' }), 'nodes.0.id'],
    ['a root gap over 10 mm', { ...base, spec: { rootGapMm: 12 } }, 'spec.rootGapMm'],
  ])('rejects %s with the path %s', (_what, value, path) => {
    expect(paths(value)).toContain(path);
  });

  it('leaves tree problems to the engine: an unknown node reference is a valid shape', () => {
    expect(paths(withRun(0, { to: 'nowhere' }))).toEqual([]);
  });
});
