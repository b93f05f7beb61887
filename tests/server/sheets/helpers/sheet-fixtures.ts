import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { spoolDesignSchema, type SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { RevisionState, SheetHeader } from '../../../../server/modules/sheets/pdf/sheet-header';

/** The sample designs shipped in samples/ (invented scenario). */
export const SAMPLE_FILES = [
  'cw-201-s03-return-14in.json',
  'cw-305-s01-rolling-offset-10in.json',
  'cw-410-s02-header-6in.json',
  'cw-118-s02-reducer-drop-10x6.json',
  'cw-522-s04-tee-mitre-10in.json',
] as const;

/** Reads and validates a sample design. */
export function loadSample(file: string): SpoolDesign {
  const raw: unknown = JSON.parse(
    readFileSync(fileURLToPath(new URL(`../../../../samples/${file}`, import.meta.url)), 'utf8'),
  );
  return spoolDesignSchema.parse(raw);
}

/** A sample design with its engine result. */
export function computedSample(file: string): { design: SpoolDesign; result: SpoolResult } {
  const design = loadSample(file);
  return { design, result: computeSpool(design) };
}

/** A title-block header for renderer tests. */
export function testHeader(mark: string, state: RevisionState = 'issued'): SheetHeader {
  const entry = {
    letter: 'B',
    state,
    issuedAt: state === 'draft' ? null : '2026-11-30T10:00:00.000Z',
    note: 'Branch moved 50 mm',
    author: 'Ada Detailer',
  };
  return {
    shopName: 'Kestrel Pipe & Steel',
    clientName: 'Harrow Fields Data Centre',
    jobNumber: 'HF-B-001',
    jobTitle: 'Condenser water, Hall B',
    site: 'Hall B',
    spoolMark: mark,
    lineNumber: 'CW-201',
    spoolStatus: 'issued',
    revision: entry,
    history: [
      ...(state === 'superseded'
        ? [
            {
              letter: 'C',
              state: 'issued' as const,
              issuedAt: '2026-12-01T08:00:00.000Z',
              note: 'Flange rotated',
              author: 'Ada Detailer',
            },
          ]
        : []),
      entry,
      {
        letter: 'A',
        state: 'superseded',
        issuedAt: '2026-11-20T09:00:00.000Z',
        note: 'First issue',
        author: 'Ada Detailer',
      },
    ],
    drawnBy: 'Ada Detailer',
    checkedBy: null,
    spoolUrl: 'http://127.0.0.1:4717/spools/5f0c1c52-0b51-4b43-9d6c-3f4f3d0a9e11',
    printedAt: new Date('2026-12-01T12:00:00Z'),
  };
}
