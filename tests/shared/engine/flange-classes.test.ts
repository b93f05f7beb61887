import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import { FLANGE_TABLE } from '../../../shared/standards/b16-5-flange-table';
import type { FlangeClass } from '../../../shared/standards/flanges';

type Design = { spec: Record<string, unknown> };
const sample = (cls?: unknown): Design => {
  const d = JSON.parse(readFileSync('samples/cw-201-s03-return-14in.json', 'utf8')) as Design;
  if (cls === undefined) delete d.spec.flangeClass;
  else d.spec.flangeClass = cls;
  return d;
};
const y = (cls: 150 | 600, nps: string) => FLANGE_TABLE[cls].find((r) => r.nps === nps)!.yWeldNeckMm;
// Growth of one weld neck's take-off from Class 150 (Y + 2 mm face) to Class 600 (Y + 7 mm).
const growth = (nps: string) => y(600, nps) + 7 - (y(150, nps) + 2);

describe('flange classes in the engine', () => {
  it('Class 600 weld necks take off Y + the 7 mm face (ASME B16.5: the face is not in Y for Class 400+)', () => {
    const r150 = computeSpool(sample(150));
    const r600 = computeSpool(sample(600));
    expect(r150.ok && r600.ok).toBe(true);
    const wn = r600.bom.items.filter((i) => i.category === 'flange' && /weld neck/.test(i.description));
    expect(wn.map((i) => [i.nps, i.count]).sort()).toEqual([
      ['14', 2],
      ['6', 1],
    ]);
    const total = (r: typeof r150) => r.pieces.reduce((s, p) => s + (p.cutLengthMm ?? 0), 0);
    // Two NPS 14 weld necks and one NPS 6: the pipe is that much shorter in Class 600.
    expect(total(r150) - total(r600)).toBeCloseTo(2 * growth('14') + growth('6'), 3);
  });

  it('Class 600 values from memory raise the unconfirmed-data warning', () => {
    const r = computeSpool(sample(600));
    expect(r.issues.some((i) => i.code === 'standard-data-unconfirmed' && /Class 600/.test(i.message))).toBe(
      true,
    );
  });

  it.each([400, 900, 1500, 2500])(
    'a design in Class %i is refused with the supported classes, not laid out',
    (cls) => {
      const r = computeSpool(sample(cls));
      expect(r.ok).toBe(false);
      expect(r.issues[0]?.code).toBe('invalid-design');
      expect(r.issues[0]?.message).toContain(`Class ${cls} is not supported`);
      expect(r.issues[0]?.message).toContain('Classes 150, 300 and 600');
      expect(r.bom.items).toEqual([]);
    },
  );

  it('a job default in Class 900 (stored before the schema refused it) is refused too, never read as Class 150', () => {
    const r = computeSpool(sample(), { jobSpec: { flangeClass: 900 as FlangeClass } });
    expect(r.ok).toBe(false);
    expect(
      r.issues
        .filter((i) => i.severity === 'error')
        .map((i) => i.message)
        .join(' '),
    ).toMatch(/Class 900 is not supported/);
    expect(JSON.stringify(r)).not.toContain('Class 150');
  });
});
