import type { PageSetup } from './page-setup';

/**
 * Colours chosen to survive a monochrome office printer: black ink for everything a fitter
 * measures from, one red for warnings (prints as a mid grey, still distinct), pale greys for fills.
 */
export const INK = {
  black: '#111111',
  text: '#1c1c1c',
  muted: '#555555',
  rule: '#888888',
  faint: '#c8c8c8',
  fill: '#f0f0f0',
  header: '#e2e2e2',
  warn: '#c4121a',
  warnFill: '#fde8e8',
  pipe: '#111111',
  dim: '#1f3f8f',
} as const;

/** Font sizes in points for a page, already multiplied by the page's type scale. */
export interface TypeSizes {
  tiny: number;
  small: number;
  body: number;
  table: number;
  heading: number;
  dimension: number;
  title: number;
  mark: number;
}

/** Type sizes for a page: nothing under 7 pt so a sheet stays readable at arm's length. */
export function typeSizes(setup: PageSetup): TypeSizes {
  const s = setup.scale;
  const at = (pt: number) => Math.max(7, Math.round(pt * s * 10) / 10);
  return {
    tiny: at(7),
    small: at(7.5),
    body: at(8.5),
    table: at(8.5),
    heading: at(10.5),
    dimension: at(9.5),
    title: at(20),
    mark: at(26),
  };
}
