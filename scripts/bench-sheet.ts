/**
 * Benchmark: median time to render the fabrication sheet of a 50-component spool
 * (two weld-neck flanges and 48 elbows in a zig-zag, NPS 6), engine run included and excluded.
 * Run: npx tsx scripts/bench-sheet.ts [iterations]
 */
import { performance } from 'node:perf_hooks';
import { computeSpool } from '../shared/engine/compute-spool';
import type { SpoolDesign } from '../shared/schemas/spool-design.schema';
import { renderSpoolSheet } from '../server/modules/sheets/pdf/spool-sheet';
import type { SheetHeader } from '../server/modules/sheets/pdf/sheet-header';

function fiftyComponentDesign(): SpoolDesign {
  const dirs = [
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
    { x: 1, y: 0, z: 0 },
    { x: 0, y: -1, z: 0 },
  ];
  const nodes: SpoolDesign['nodes'] = [{ id: 'f1', kind: 'end', end: { type: 'weld-neck-flange' } }];
  const runs: SpoolDesign['runs'] = [];
  for (let i = 1; i <= 48; i += 1) nodes.push({ id: `e${i}`, kind: 'elbow' });
  nodes.push({ id: 'f2', kind: 'end', end: { type: 'weld-neck-flange' } });
  for (let i = 0; i < nodes.length - 1; i += 1) {
    runs.push({
      id: `r${i + 1}`,
      from: nodes[i]!.id,
      to: nodes[i + 1]!.id,
      direction: dirs[i % 4]!,
      length: {
        mm: 900 + (i % 5) * 50,
        kind: i === 0 || i === nodes.length - 2 ? 'centre-to-face' : 'centre-to-centre',
      },
    });
  }
  return {
    format: 'tackline.spool',
    version: 1,
    mark: 'BENCH-50',
    spec: { nps: '6' },
    origin: { x: 0, y: 0, z: 0 },
    nodes,
    runs,
  };
}

const header: SheetHeader = {
  shopName: 'Kestrel Pipe & Steel',
  clientName: 'Harrow Fields Data Centre',
  jobNumber: 'HF-B-001',
  jobTitle: 'Condenser water, Hall B',
  site: 'Hall B',
  spoolMark: 'BENCH-50',
  lineNumber: 'CW-999',
  spoolStatus: 'issued',
  revision: {
    letter: 'A',
    state: 'issued',
    issuedAt: '2026-11-30T10:00:00Z',
    note: 'Benchmark',
    author: 'Bench',
  },
  history: [
    { letter: 'A', state: 'issued', issuedAt: '2026-11-30T10:00:00Z', note: 'Benchmark', author: 'Bench' },
  ],
  drawnBy: 'Bench',
  checkedBy: null,
  spoolUrl: 'http://127.0.0.1:4717/spools/00000000-0000-0000-0000-000000000000',
  printedAt: new Date(),
};

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

async function main(): Promise<void> {
  const iterations = Number(process.argv[2] ?? 20);
  const design = fiftyComponentDesign();
  const components = computeSpool(design).components.length;
  const renderOnly: number[] = [];
  const withEngine: number[] = [];
  let pages = 0;
  let bytes = 0;
  // Two warm-up runs: font parsing and JIT are a one-off per process.
  for (let i = 0; i < iterations + 2; i += 1) {
    const t0 = performance.now();
    const result = computeSpool(design);
    const t1 = performance.now();
    const out = await renderSpoolSheet({ header, design, result, units: 'mm', paper: 'A3' });
    const t2 = performance.now();
    if (i >= 2) {
      renderOnly.push(t2 - t1);
      withEngine.push(t2 - t0);
    }
    pages = out.pageCount;
    bytes = out.pdf.length;
  }
  console.log(`spool sheet, ${components} components, A3, ${pages} pages, ${(bytes / 1024).toFixed(0)} kB`);
  console.log(
    `median render ${median(renderOnly).toFixed(1)} ms, with engine ${median(withEngine).toFixed(1)} ms (n=${iterations}, Node ${process.version})`,
  );
}

if (process.env.BENCH_PDF) {
  void (async () => {
    const design = fiftyComponentDesign();
    const { writeFileSync } = await import('node:fs');
    const out = await renderSpoolSheet({
      header,
      design,
      result: computeSpool(design),
      units: 'mm',
      paper: 'A3',
    });
    writeFileSync(process.env.BENCH_PDF!, out.pdf);
  })();
} else {
  void main();
}
