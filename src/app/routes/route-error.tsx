import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorState } from '../../components/ui/ErrorState';
import { ApiError } from '../../lib/api-error';
import { NotFoundPage } from './not-found';

/** Route-level error boundary: 404s read as "no such page", anything else offers a reload. */
export function RouteError() {
  const error = useRouteError();
  if ((isRouteErrorResponse(error) && error.status === 404) || (error instanceof ApiError && error.isNotFound)) {
    return <NotFoundPage />;
  }
  return (
    <div className="mx-auto max-w-xl py-12">
      <ErrorState
        title="This page failed"
        error={isRouteErrorResponse(error) ? new Error(error.statusText || `Error ${error.status}`) : error}
        onRetry={() => window.location.reload()}
      />
    </div>
  );
}
