/**
 * Placeholder for the 3D spool editor (to be replaced by the editor itself).
 * The spool page loads this file lazily, inside an error boundary and Suspense,
 * with props `{ spoolId, readOnly }`.
 */
export default function SpoolEditor({ spoolId, readOnly }: { spoolId: string; readOnly: boolean }) {
  return (
    <div
      data-spool-id={spoolId}
      className="flex min-h-64 flex-col items-center justify-center gap-2 rounded-lg border border-dashed border-steel-300 bg-steel-50 p-8 text-center"
    >
      <p className="font-display text-xl font-semibold text-ink-800">The 3D spool editor is coming</p>
      <p className="max-w-md text-sm text-steel-600">
        {readOnly
          ? 'You will be able to turn the spool around and read its dimensions here.'
          : 'You will lay this spool out here from real fitting dimensions, with cut lengths worked out as you go.'}
      </p>
    </div>
  );
}
