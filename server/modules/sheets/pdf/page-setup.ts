import type { PaperSize } from '../../../../shared/schemas/sheet-query.schema';

export type { PaperSize };

/** PDF points per millimetre (1 pt = 1/72 in). */
export const PT_PER_MM = 72 / 25.4;

/** Millimetres to PDF points. */
export function mm(value: number): number {
  return value * PT_PER_MM;
}

/** Portrait width × height in points (ISO 216 and ANSI sizes). */
const PORTRAIT_PT: Record<PaperSize, [number, number]> = {
  A3: [mm(297), mm(420)],
  A4: [mm(210), mm(297)],
  Letter: [612, 792], // 8.5 × 11 in
  Tabloid: [792, 1224], // 11 × 17 in
};

export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** Page geometry in points, origin top-left, y down (pdfkit's space). */
export interface PageSetup {
  paper: PaperSize;
  width: number;
  height: number;
  /** Inside of the drawing border. */
  frame: Rect;
  /** Type scale: 1 on the large sheets, smaller on A4/Letter so tables still fit. */
  scale: number;
  /** Height of the title block strip along the bottom of the frame. */
  titleBlockHeight: number;
  /** Gap between layout regions. */
  gutter: number;
}

/** Landscape page geometry for a paper size. */
export function pageSetup(paper: PaperSize): PageSetup {
  const [pw, ph] = PORTRAIT_PT[paper];
  const width = Math.max(pw, ph);
  const height = Math.min(pw, ph);
  const large = paper === 'A3' || paper === 'Tabloid';
  const margin = large ? mm(10) : mm(7);
  const scale = large ? 1 : 0.82;
  return {
    paper,
    width,
    height,
    frame: { x: margin, y: margin, w: width - 2 * margin, h: height - 2 * margin },
    scale,
    titleBlockHeight: large ? mm(36) : mm(31),
    gutter: large ? mm(4) : mm(3),
  };
}

/** The frame above the title block: where drawings, tables and templates go. */
export function contentArea(setup: PageSetup): Rect {
  const { frame, titleBlockHeight } = setup;
  return { x: frame.x, y: frame.y, w: frame.w, h: frame.h - titleBlockHeight };
}
