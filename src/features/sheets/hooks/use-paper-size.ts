import { useCallback, useState } from 'react';
import { DEFAULT_PAPER, isPaperSize, type PaperSize } from '../../../../shared/schemas/sheet-query.schema';

const STORAGE_KEY = 'tackline.sheets.paper';

function stored(): PaperSize {
  try {
    const value = window.localStorage.getItem(STORAGE_KEY);
    return isPaperSize(value) ? value : DEFAULT_PAPER;
  } catch {
    return DEFAULT_PAPER;
  }
}

/** The paper size this browser last printed on (each shop office has its own printer). */
export function usePaperSize(): [PaperSize, (paper: PaperSize) => void] {
  const [paper, setPaperState] = useState<PaperSize>(stored);
  const setPaper = useCallback((next: PaperSize) => {
    setPaperState(next);
    try {
      window.localStorage.setItem(STORAGE_KEY, next);
    } catch {
      // Private mode: the choice lasts for this page only.
    }
  }, []);
  return [paper, setPaper];
}
