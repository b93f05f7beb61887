import type { Rect } from './page-setup';

/** What a block reports after placing itself in an area. */
export interface Placement {
  /** Height used, in points; 0 when nothing fitted. */
  used: number;
  /** The part still to place (next column or page), or null when done. */
  rest: FlowBlock | null;
}

/**
 * A piece of sheet content that can be placed top-down in a column: a table, a paragraph list,
 * a fixed-size figure. `fresh` is true at the top of an empty column; a block must then place
 * something, so the layout never loops.
 */
export interface FlowBlock {
  place(doc: PDFKit.PDFDocument, area: Rect, fresh: boolean): Placement;
}

/** Supplies columns: the first page's free columns, then those of each continuation page it adds. */
export interface ColumnSource {
  first: Rect[];
  /** Adds a page and returns its columns. */
  addPage: () => Rect[];
}

/** Places blocks in order through columns and pages; returns the number of pages added. */
export function flowBlocks(
  doc: PDFKit.PDFDocument,
  blocks: FlowBlock[],
  source: ColumnSource,
  gap: number,
): number {
  let pagesAdded = 0;
  const queue = [...source.first];
  let column = queue.shift() ?? nextPage();
  let cursor = column.y;

  function nextPage(): Rect {
    pagesAdded += 1;
    queue.push(...source.addPage());
    const next = queue.shift();
    if (!next) throw new Error('A continuation page must offer at least one column');
    return next;
  }
  function nextColumn(): void {
    column = queue.shift() ?? nextPage();
    cursor = column.y;
  }

  for (const block of blocks) {
    let current: FlowBlock | null = block;
    while (current) {
      const fresh = cursor === column.y;
      const area = { x: column.x, y: cursor, w: column.w, h: column.y + column.h - cursor };
      const { used, rest }: Placement = current.place(doc, area, fresh);
      if (used > 0) cursor += used + gap;
      if (rest) {
        current = rest;
        nextColumn();
      } else {
        current = null;
      }
    }
  }
  return pagesAdded;
}
