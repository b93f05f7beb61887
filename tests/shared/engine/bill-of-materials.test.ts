import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { BomItem, SpoolResult } from '../../../shared/engine/compute-result';

type Design = { spec: Record<string, unknown>; nodes: Array<Record<string, unknown>> };
const load = (f: string): Design => JSON.parse(readFileSync(`samples/${f}`, 'utf8')) as Design;
const bom = (r: SpoolResult, category: BomItem['category']) =>
  r.bom.items.filter((i) => i.category === category);

describe('bill of materials: every line has its size, rating, ends, material and standard', () => {
  it('10 in and 6 in pipe read differently and total per size and schedule', () => {
    const r = computeSpool(load('cw-118-s02-reducer-drop-10x6.json'));
    expect(r.ok).toBe(true);
    const pipe = bom(r, 'pipe');
    expect(pipe.map((p) => p.sizeLabel)).toEqual(['NPS 10', 'NPS 6']);
    expect(new Set(pipe.map((p) => p.description)).size).toBe(2);
    for (const p of pipe) {
      expect(p.description.startsWith(`${p.sizeLabel} Pipe STD`)).toBe(true);
      expect(p).toMatchObject({
        rating: 'STD',
        standard: 'ASME B36.10M',
        material: 'ASTM A106 Gr B',
        loose: false,
      });
      const pieces = r.pieces.filter((x) => x.nps === p.nps && x.schedule === 'STD');
      expect(p.count).toBe(pieces.length);
      expect(p.totalCutMm).toBeCloseTo(
        pieces.reduce((s, x) => s + x.cutLengthMm!, 0),
        6,
      );
    }
  });

  it('a reducer carries both sizes, elbows and flanges their NPS', () => {
    const r = computeSpool(load('cw-118-s02-reducer-drop-10x6.json'));
    const reducer = bom(r, 'fitting').find((i) => /Reducer/.test(i.description))!;
    expect(reducer).toMatchObject({
      nps: '10',
      nps2: '6',
      sizeLabel: 'NPS 10 × 6',
      endPrep: 'BW',
      standard: 'ASME B16.9',
    });
    expect(reducer.description).toBe('NPS 10 × 6 Reducer eccentric STD, ASTM A234 WPB, ASME B16.9');
    for (const e of bom(r, 'fitting').filter((i) => /Elbow/.test(i.description))) {
      expect(e.description).toMatch(/^NPS 6 Elbow/);
    }
    const flange = bom(r, 'flange')[0]!;
    expect(flange).toMatchObject({
      sizeLabel: 'NPS 10',
      rating: 'Class 150, STD bore',
      endPrep: 'RF × BW',
      material: 'ASTM A105',
      standard: 'ASME B16.5',
    });
  });

  it('an outlet says its own size and the header it sits on', () => {
    const r = computeSpool(load('cw-410-s02-header-6in.json'));
    const hc = bom(r, 'socket-fitting')[0]!;
    expect(hc).toMatchObject({
      nps: '1',
      nps2: '6',
      sizeLabel: 'NPS 1 on NPS 6',
      rating: 'Class 3000',
      endPrep: 'SW',
      standard: 'ASME B16.11',
      count: 3,
    });
  });

  it('kits a stud set and a gasket for every flange face, loose (ASME B16.5-2009 Table 7 lengths)', () => {
    const r = computeSpool(load('cw-201-s03-return-14in.json'));
    // Two NPS 14 and one NPS 6 Class 150 weld necks.
    const studs = bom(r, 'bolting');
    // ASME B16.5-2009 Table 7: NPS 14 Class 150 = 12 studs 1 in × 135 mm; NPS 6 = 8 × 3/4 in × 100 mm.
    expect(studs.map((s) => [s.sizeLabel, s.count, s.bolting])).toEqual([
      ['NPS 14', 24, { perJoint: 12, joints: 2, diameterIn: '1', lengthMm: 135, nutCount: 48 }],
      ['NPS 6', 8, { perJoint: 8, joints: 1, diameterIn: '3/4', lengthMm: 100, nutCount: 16 }],
    ]);
    for (const s of studs) {
      expect(s).toMatchObject({
        loose: true,
        rating: 'Class 150',
        material: 'ASTM A193 B7 studs, A194 2H nuts',
        note: null,
      });
    }
    const gaskets = bom(r, 'gasket');
    expect(gaskets.map((g) => [g.sizeLabel, g.count, g.standard, g.loose])).toEqual([
      ['NPS 14', 2, 'ASME B16.20', true],
      ['NPS 6', 1, 'ASME B16.20', true],
    ]);
    // Welded items are not loose.
    for (const i of r.bom.items.filter((x) => x.category !== 'bolting' && x.category !== 'gasket'))
      expect(i.loose).toBe(false);
  });

  it('gasket kind and bolting material come from the spec; a blind flange is loose and kitted once', () => {
    const d = load('cw-522-s04-tee-mitre-10in.json');
    d.spec.gasketType = 'sheet';
    d.spec.boltingMaterial = 'ASTM A193 B8M Cl 2 studs, A194 8M nuts';
    const r = computeSpool(d);
    expect(r.ok).toBe(true);
    const g = bom(r, 'gasket');
    expect(g).toHaveLength(1);
    expect(g[0]).toMatchObject({
      standard: 'ASME B16.21',
      material: 'compressed non-asbestos fibre sheet, 1.5 mm',
      count: 2,
    });
    expect(bom(r, 'bolting')[0]!.material).toBe('ASTM A193 B8M Cl 2 studs, A194 8M nuts');
    expect(bom(r, 'flange').find((f) => /blind/.test(f.description))).toMatchObject({
      loose: true,
      endPrep: 'RF',
    });
  });

  it('Class 600 studs (ASME B16.5-2013 Table 15: NPS 14 = 20 studs × 235 mm) carry the secondary-source note', () => {
    const d = load('cw-201-s03-return-14in.json');
    d.spec.flangeClass = 600;
    const r = computeSpool(d);
    const s14 = bom(r, 'bolting').find((s) => s.nps === '14')!;
    expect(s14.bolting).toMatchObject({ perJoint: 20, lengthMm: 235, diameterIn: '1-3/8' });
    expect(s14.note).toMatch(/secondary source.*check before ordering/);
  });

  it('a spec with an unknown gasket kind is refused by the schema', () => {
    const d = load('cw-201-s03-return-14in.json');
    d.spec.gasketType = 'rubber';
    const r = computeSpool(d);
    expect(r.ok).toBe(false);
    expect(r.issues[0]?.message).toMatch(/^spec\.gasketType/);
  });
});

describe('values from a secondary source are flagged like values from memory', () => {
  it('half couplings (F not yet checked against the standard) raise one warning for the three', () => {
    const r = computeSpool(load('cw-410-s02-header-6in.json'));
    const w = r.issues.filter((i) => i.code === 'standard-data-unconfirmed');
    expect(w).toHaveLength(1);
    expect(w[0]!.message).toMatch(/NPS 1 half coupling/i);
    expect(w[0]!.message).toMatch(/not yet checked against ASME B16.11: confirm before cutting/);
    expect(w[0]!.message).not.toMatch(/mumbadevi|vaibhav|scribd/i);
  });

  it('Class 300 NPS 2 drilling (read from a secondary source) raises a warning saying so', () => {
    const d = load('cw-305-s01-rolling-offset-10in.json');
    d.spec.flangeClass = 300;
    d.spec.nps = '2';
    const r = computeSpool(d);
    const texts = r.issues.map((i) => i.message).join('\n');
    expect(texts).toMatch(/secondary source/);
    expect(texts).not.toMatch(/mumbadevi|vaibhav|scribd|pdfcoffee/i);
  });

  it('component sources name the standard and table only', () => {
    const r = computeSpool(load('cw-201-s03-return-14in.json'));
    const f = r.components.find((c) => c.kind === 'end' && c.source)!;
    expect(f.source).toBe('ASME B16.5 Class 150');
  });
});
