/**
 * Tackline's own editor icons: 20 × 20 strokes drawn for this product, in currentColor.
 */
const paths = {
  undo: 'M7 5L3 9l4 4M3 9h9a5 5 0 010 10h-2',
  redo: 'M13 5l4 4-4 4M17 9H8a5 5 0 000 10h2',
  run: 'M3 10h14M13 6l4 4-4 4',
  tee: 'M2 13h16M10 13V3',
  branch: 'M2 14h16M10 14c0-4 0-7 0-11M7 6l3-3 3 3',
  socket: 'M2 14h16M8 14V9h4v5',
  reducer: 'M2 6v8l7-2V8zM9 8h9v4H9',
  flange: 'M6 3v14M9 3v14M9 10h9M3 6h3M3 14h3',
  trash: 'M4 6h12M8 6V4h4v2M6 6l1 11h6l1-11',
  iso: 'M10 2l7 4v8l-7 4-7-4V6zM10 10l7-4M10 10v8M10 10L3 6',
  plan: 'M3 3h14v14H3zM3 10h14M10 3v14',
  elevation: 'M3 17h14M5 17V7h10v10M5 7l5-4 5 4',
  upload: 'M10 14V3M6 7l4-4 4 4M3 14v3h14v-3',
  download: 'M10 3v11M6 10l4 4 4-4M3 14v3h14v-3',
  cube: 'M10 2l7 4v8l-7 4-7-4V6zM3 6l7 4 7-4M10 10v8',
  labels: 'M3 5h14M3 10h9M3 15h12',
  issue: 'M10 3l8 14H2zM10 8v4M10 14.5v.5',
  weight: 'M6 7h8l2 10H4zM8 7a2 2 0 114 0',
  keyboard: 'M2 5h16v10H2zM5 8h1M8 8h1M11 8h1M14 8h1M6 12h8',
} as const;

/** Names of the editor icons. */
export type EditorIconName = keyof typeof paths;

/** One editor icon, decorative (the button beside it carries the words). */
export function EditorIcon({ name, className = 'h-5 w-5' }: { name: EditorIconName; className?: string }) {
  return (
    <svg viewBox="0 0 20 20" aria-hidden="true" className={className} fill="none" stroke="currentColor" strokeWidth="1.7" strokeLinecap="round" strokeLinejoin="round">
      <path d={paths[name]} />
    </svg>
  );
}
