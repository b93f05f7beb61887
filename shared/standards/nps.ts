import { z } from 'zod';

/**
 * Nominal pipe sizes Tackline has standards data for, smallest first.
 * NPS 3-1/2 and 22 are left out on purpose: rarely used and not tabulated here.
 */
// prettier-ignore
export const NPS_VALUES = [
  '1/2', '3/4', '1', '1-1/4', '1-1/2', '2', '2-1/2', '3', '4', '5',
  '6', '8', '10', '12', '14', '16', '18', '20', '24',
] as const;

/** A nominal pipe size, written as the trade writes it (`'1-1/2'`, `'6'`). */
export type Nps = (typeof NPS_VALUES)[number];

/** Zod schema for {@link Nps}; the error lists the accepted sizes. */
export const npsSchema = z.enum(NPS_VALUES, {
  error: () => `NPS must be one of ${NPS_VALUES.join(', ')}`,
});

// prettier-ignore
const NPS_INCHES: Record<Nps, number> = {
  '1/2': 0.5, '3/4': 0.75, '1': 1, '1-1/4': 1.25, '1-1/2': 1.5, '2': 2, '2-1/2': 2.5,
  '3': 3, '4': 4, '5': 5, '6': 6, '8': 8, '10': 10, '12': 12, '14': 14, '16': 16,
  '18': 18, '20': 20, '24': 24,
};

// DN (metric designation) for each NPS, per ASME B36.10M / ISO 6708.
// prettier-ignore
const DN: Record<Nps, number> = {
  '1/2': 15, '3/4': 20, '1': 25, '1-1/4': 32, '1-1/2': 40, '2': 50, '2-1/2': 65,
  '3': 80, '4': 100, '5': 125, '6': 150, '8': 200, '10': 250, '12': 300, '14': 350,
  '16': 400, '18': 450, '20': 500, '24': 600,
};

/**
 * The nominal size as a number of inches (NPS 1-1/2 → 1.5). A designation, not a
 * diameter: use the pipe OD for geometry. Used for diameter-inches and LR radii.
 */
export function npsInches(nps: Nps): number {
  return NPS_INCHES[nps];
}

/** Orders two sizes: negative if `a` is smaller, 0 if equal, positive if larger. */
export function compareNps(a: Nps, b: Nps): number {
  return NPS_INCHES[a] - NPS_INCHES[b];
}

/** The DN metric size for an NPS (NPS 6 → DN 150). */
export function dnOf(nps: Nps): number {
  return DN[nps];
}

/** True when `text` is one of {@link NPS_VALUES}. */
export function isNps(text: string): text is Nps {
  return (NPS_VALUES as readonly string[]).includes(text);
}

/** Sizes strictly smaller than `nps`, nearest first (NPS 4 → 3, 2-1/2, 2, ...). */
export function smallerSizes(nps: Nps): Nps[] {
  const i = NPS_VALUES.indexOf(nps);
  return NPS_VALUES.slice(0, i).reverse();
}
