import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

const run = promisify(execFile);
const tsx = join('node_modules', '.bin', 'tsx');
const cli = (file: string) =>
  run(tsx, ['shared/cli/compute.ts', file]).then(
    (r) => ({ code: 0, stdout: r.stdout, stderr: r.stderr }),
    (e: { code: number; stdout: string; stderr: string }) => ({
      code: e.code,
      stdout: e.stdout,
      stderr: e.stderr,
    }),
  );

describe('compute CLI', () => {
  const dir = mkdtempSync(join(tmpdir(), 'tackline-cli-'));

  it('prints the result of a sample as JSON', async () => {
    const r = await cli('samples/cw-305-s01-rolling-offset-10in.json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { format: string; ok: boolean; pieces: unknown[] };
    expect(out.format).toBe('tackline.spool-result');
    expect(out.ok).toBe(true);
    expect(out.pieces).toHaveLength(3);
  });

  it('exits 1 naming a missing file', async () => {
    const r = await cli(join(dir, 'nope.json'));
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('no such file');
  });

  it('exits 1 on bad JSON', async () => {
    const f = join(dir, 'bad.json');
    writeFileSync(f, '{ "format": ');
    const r = await cli(f);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('not valid JSON');
  });

  it('exits 1 naming the schema path of a bad design', async () => {
    const f = join(dir, 'shape.json');
    writeFileSync(
      f,
      JSON.stringify({
        format: 'tackline.spool',
        version: 1,
        origin: { x: 0, y: 0, z: 0 },
        nodes: [{ id: 'a', kind: 'end', end: { type: 'hose' } }],
        runs: [],
      }),
    );
    const r = await cli(f);
    expect(r.code).toBe(1);
    expect(r.stderr).toContain('nodes.0.end.type');
  });
}, 60_000);
