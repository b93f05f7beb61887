import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { jobSpecOverrides } from '../../../shared/engine/job-spec-overrides';
import type { Job } from '../../../shared/schemas/job.schema';
import { loadSample } from './helpers/sheet-fixtures';

const spec = (flangeClass: number): Pick<Job, 'spec'> => ({
  spec: {
    material: 'ASTM A106 Gr B',
    schedule: 'STD',
    flangeClass: flangeClass as Job['spec']['flangeClass'],
    rootGapMm: 3,
    sawKerfMm: 3,
    minPieceLengthMm: 50,
  },
});

/** The return sample with its own class removed, so the job's class applies. */
function design() {
  const d = loadSample('cw-201-s03-return-14in.json') as { spec?: Record<string, unknown> };
  delete d.spec?.flangeClass;
  return d;
}

describe('a job class reaches the sheet as stored, never as Class 150', () => {
  it('Class 600 job: the flanges are laid out as Class 600', () => {
    const out = jobSpecOverrides(spec(600).spec);
    expect(out.flangeClass).toBe(600);
    const r = computeSpool(design(), { jobSpec: out });
    expect(r.spec.flangeClass).toBe(600);
    const flanges = r.bom.items.filter((i) => i.category === 'flange');
    expect(flanges.length).toBeGreaterThan(0);
    for (const f of flanges) expect(f.description).toContain('Class 600');
  });

  it('a job stored with Class 400 (no table) is refused: an error naming the class, no Class 150 anywhere', () => {
    const out = jobSpecOverrides(spec(400).spec);
    expect(out.flangeClass).toBe(400);
    const r = computeSpool(design(), { jobSpec: out });
    expect(r.ok).toBe(false);
    expect(
      r.issues.some(
        (i) => i.severity === 'error' && /Class 400 is not supported.*150, 300 and 600/.test(i.message),
      ),
    ).toBe(true);
    expect(JSON.stringify(r.bom)).not.toContain('Class 150');
    expect(r.spec.flangeClass).toBe(400);
  });
});
