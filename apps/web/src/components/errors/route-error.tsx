import { useQueryClient } from '@tanstack/react-query';
import { isRouteErrorResponse, useNavigate, useRouteError } from 'react-router-dom';
import { paths } from '../../config/paths';
import { isApiError } from '../../lib/api-client';
import { Button, LinkButton } from '../ui/button';
import { ErrorPanel } from './error-panel';

/** The error element of every route: a failed loader or a crashed page lands here. */
export function RouteError() {
  const error = useRouteError();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const shown = isRouteErrorResponse(error)
    ? new Error(error.status === 404 ? 'This page does not exist.' : error.statusText)
    : error;

  // A 4xx answers the same way again; offering a retry would only waste a click.
  const retryable = !isApiError(shown) || shown.status === 0 || shown.status >= 500;

  const retry = () => {
    // Drop failed queries so the loader asks the API again instead of rethrowing the cached error.
    queryClient.removeQueries({ predicate: (query) => query.state.status === 'error' });
    void navigate('.', { replace: true });
  };

  return (
    <div className="mx-auto max-w-3xl px-4 py-8">
      <ErrorPanel
        error={shown}
        actions={
          <>
            {retryable && (
              <Button size="sm" onClick={retry}>
                Try again
              </Button>
            )}
            <LinkButton size="sm" variant="ghost" to={paths.boards.getHref()}>
              All boards
            </LinkButton>
          </>
        }
      />
    </div>
  );
}
