import { Button } from './Button';

interface StaleNoticeProps {
  what: string;
  onReload: () => void;
  reloading?: boolean;
}

/** Shown after a 409: someone else saved first; the user's input stays in the form. */
export function StaleNotice({ what, onReload, reloading }: StaleNoticeProps) {
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-md border border-spark-500/50 bg-spark-100 p-3 text-sm">
      <p className="font-semibold text-ink-900">Someone else changed this {what} while you were editing.</p>
      <p className="text-ink-800">
        Nothing of yours was saved, and your entries are still here. Load the latest version: the fields you did not touch
        take the new values, yours stay as you typed them. Check them, then save again.
      </p>
      <div>
        <Button variant="secondary" onClick={onReload} busy={reloading}>
          Load latest version
        </Button>
      </div>
    </div>
  );
}
