import type { FlowBlock, Placement } from './flow-layout';
import type { Rect } from './page-setup';
import { INK } from './sheet-style';
import { drawText, measureWrapped } from './text';

export interface ParagraphSpec {
  title: string;
  paragraphs: string[];
  size: number;
  /** Warning styling: red rule and title, for cautions and engine errors. */
  tone?: 'plain' | 'caution' | 'error';
  /** Prefix each paragraph with a bullet or its number. */
  list?: 'bullet' | 'numbered' | 'none';
}

/** A titled list of wrapped paragraphs; splits between paragraphs when a column fills. */
export function paragraphBlock(spec: ParagraphSpec, start = 0): FlowBlock {
  return {
    place(doc: PDFKit.PDFDocument, area: Rect, fresh: boolean): Placement {
      const size = spec.size;
      const tone = spec.tone ?? 'plain';
      const accent = tone === 'plain' ? INK.black : INK.warn;
      const indent = spec.list === 'none' ? 0 : size * 1.4;
      const boxPad = tone === 'plain' ? 0 : 4;
      const innerW = area.w - 2 * boxPad;
      const titleH = size * 1.25 + 3;
      let y = area.y + boxPad + titleH;
      let count = 0;
      const heights: number[] = [];
      for (let i = start; i < spec.paragraphs.length; i += 1) {
        const h = measureWrapped(doc, spec.paragraphs[i]!, innerW - indent, { size, lineGap: 1 }) + 2.5;
        if (y + h + boxPad > area.y + area.h && !(fresh && count === 0)) break;
        heights.push(h);
        y += h;
        count += 1;
      }
      if (count === 0 && !fresh) return { used: 0, rest: this };
      const used = y - area.y + boxPad;

      doc.save();
      if (tone !== 'plain') {
        doc.rect(area.x, area.y, area.w, used).fill(tone === 'error' ? INK.warnFill : '#fff6f6');
        doc
          .lineWidth(tone === 'error' ? 1.6 : 0.9)
          .strokeColor(accent)
          .rect(area.x, area.y, area.w, used)
          .stroke();
      }
      const title = start > 0 ? `${spec.title} (continued)` : spec.title;
      drawText(doc, title.toUpperCase(), area.x + boxPad, area.y + boxPad, {
        font: 'cond-bold',
        size: size * 1.2,
        color: accent,
        width: innerW,
      });
      let py = area.y + boxPad + titleH;
      for (let k = 0; k < count; k += 1) {
        const i = start + k;
        if (spec.list !== 'none') {
          const marker = spec.list === 'numbered' ? `${i + 1}.` : '•';
          drawText(doc, marker, area.x + boxPad, py, { font: 'body-semibold', size, color: accent });
        }
        drawText(doc, spec.paragraphs[i]!, area.x + boxPad + indent, py, {
          size,
          width: innerW - indent,
          wrap: true,
          lineGap: 1,
        });
        py += heights[k]!;
      }
      doc.restore();
      const next = start + count;
      return { used, rest: next < spec.paragraphs.length ? paragraphBlock(spec, next) : null };
    },
  };
}
