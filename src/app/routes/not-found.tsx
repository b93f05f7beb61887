import { ButtonLink } from '../../components/ui/Button';

/** Anything the router does not know, or a record that does not exist for this shop. */
export function NotFoundPage({ what = 'page' }: { what?: string }) {
  return (
    <div className="mx-auto flex max-w-lg flex-col items-start gap-4 py-16">
      <p className="font-mono text-sm text-steel-500">404</p>
      <h1 className="text-4xl font-bold text-ink-900">No such {what}</h1>
      <p className="text-steel-600">
        It may have been archived, or the link is mistyped. Records of other shops are never shown.
      </p>
      <ButtonLink to="/" variant="primary">
        Back to jobs
      </ButtonLink>
    </div>
  );
}
