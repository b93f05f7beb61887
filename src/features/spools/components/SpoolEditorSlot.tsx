import { lazy, Suspense } from 'react';
import { ErrorBoundary } from '../../../components/ui/ErrorBoundary';
import { ErrorState } from '../../../components/ui/ErrorState';
import { LoadingBlock } from '../../../components/ui/Spinner';

// The editor (three.js and friends) is its own chunk, loaded only on the spool page.
const SpoolEditor = lazy(() => import('../../editor/SpoolEditor'));

/** Where the 3D editor sits on the spool page; a WebGL or editor failure stays inside this frame. */
export function SpoolEditorSlot({ spoolId, readOnly }: { spoolId: string; readOnly: boolean }) {
  return (
    <section aria-label="Spool layout" className="min-h-64 rounded-lg border border-steel-200 bg-white p-2">
      <ErrorBoundary
        resetKey={spoolId}
        fallback={(error, reset) => (
          <ErrorState
            title="The spool editor stopped"
            error={error}
            onRetry={reset}
          />
        )}
      >
        <Suspense fallback={<LoadingBlock label="Loading the editor…" />}>
          <SpoolEditor spoolId={spoolId} readOnly={readOnly} />
        </Suspense>
      </ErrorBoundary>
    </section>
  );
}
