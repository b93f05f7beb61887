import { messageOf } from '../../lib/api-error';
import { Button } from './Button';

interface ErrorStateProps {
  error: unknown;
  title?: string;
  onRetry?: () => void;
}

/** A region that failed to load: what went wrong in plain words, and a retry. */
export function ErrorState({ error, title = 'This could not be loaded', onRetry }: ErrorStateProps) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-lg border border-danger-600/30 bg-danger-50 p-5">
      <p className="font-display text-lg font-semibold text-danger-700">{title}</p>
      <p className="text-sm text-ink-800">{messageOf(error)}</p>
      {onRetry ? (
        <Button variant="secondary" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}

/** A one-line error under a form or beside an action. */
export function InlineError({ error }: { error: unknown }) {
  if (!error) return null;
  return (
    <p role="alert" className="rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700">
      {messageOf(error)}
    </p>
  );
}
