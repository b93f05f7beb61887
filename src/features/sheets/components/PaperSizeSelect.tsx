import { useId } from 'react';
import { PAPER_LABELS, PAPER_SIZES, type PaperSize } from '../../../../shared/schemas/sheet-query.schema';

interface PaperSizeSelectProps {
  value: PaperSize;
  onChange: (paper: PaperSize) => void;
}

/** Paper size picker for printed sheets (landscape always). */
export function PaperSizeSelect({ value, onChange }: PaperSizeSelectProps) {
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="text-sm font-semibold text-ink-800">
        Paper
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as PaperSize)}
        className="min-h-11 rounded-md border border-steel-300 bg-white px-3 text-sm text-ink-900 focus:border-spark-500 focus:outline-none focus:ring-2 focus:ring-spark-300"
      >
        {PAPER_SIZES.map((p) => (
          <option key={p} value={p}>
            {PAPER_LABELS[p]}
          </option>
        ))}
      </select>
    </div>
  );
}
