import PDFDocument from 'pdfkit';
import { describe, expect, it } from 'vitest';
import { registerSheetFonts } from '../../../server/modules/sheets/pdf/fonts';
import { printable } from '../../../server/modules/sheets/pdf/text';

describe('printable', () => {
  it('keeps what the sheet fonts can draw and replaces what they cannot', () => {
    const doc = new PDFDocument({ autoFirstPage: false });
    registerSheetFonts(doc);
    doc.font('body');
    // Barlow carries Latin, degree, minus, middle dot and curly quotes, but no arrows or check marks.
    expect(printable(doc, 'Elbow 90° LR · −2 mm, chiller’s × 2 …')).toBe(
      'Elbow 90° LR · −2 mm, chiller’s × 2 …',
    );
    expect(printable(doc, 'gap → 3 mm, F1 ↔ F2 ✓')).toBe('gap -> 3 mm, F1 <-> F2 OK');
    expect(printable(doc, '⊕')).toBe('?');
    doc.font('mono');
    // JetBrains Mono does have arrows: nothing to replace.
    expect(printable(doc, '→')).toBe('→');
  });
});
