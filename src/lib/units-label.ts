import type { LengthUnits } from '../../shared/units/length-format';

/** Human label for a job's units setting. */
export function unitsLabel(units: LengthUnits): string {
  return units === 'mm' ? 'millimetres (mm)' : 'feet-inches (to 1/16")';
}
