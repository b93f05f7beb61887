import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { designFromJson, designToJson, fileNameFor } from '../../../../src/features/editor/io/design-file';

const SAMPLE = path.resolve(import.meta.dirname, '../../../../samples/cw-201-s03-return-14in.json');

describe('design file', () => {
  it('round-trips a sample design through export and import unchanged', () => {
    const text = readFileSync(SAMPLE, 'utf8');
    const first = designFromJson(text);
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const again = designFromJson(designToJson(first.design));
    expect(again).toEqual({ ok: true, design: first.design });
  });

  it('refuses text that is not JSON, and names the first schema problem with its path', () => {
    expect(designFromJson('{nope')).toEqual({ ok: false, message: expect.stringMatching(/not JSON/) });
    const bad = JSON.parse(readFileSync(SAMPLE, 'utf8'));
    bad.nodes[0].end.type = 'welded-on-somehow';
    const r = designFromJson(JSON.stringify(bad));
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/nodes\.0\.end/);
    expect(designFromJson(JSON.stringify({ format: 'something-else' })).ok).toBe(false);
  });

  it('makes safe file names from spool marks', () => {
    expect(fileNameFor('CW-201-S03', 'json')).toBe('CW-201-S03.json');
    expect(fileNameFor('a/b c', 'glb')).toBe('a_b_c.glb');
    expect(fileNameFor(undefined, 'json')).toBe('spool.json');
  });
});
