import type { ReactNode } from 'react';
import { isApiError } from '../../lib/api-client';

/** The heading a technician sees for an error: what failed, in plain words. */
function titleFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong in the page';
  if (error.status === 0) return 'No connection to the API';
  if (error.status === 404) return 'Not found';
  if (error.status === 409) return 'Conflict';
  if (error.status === 413) return 'Too large';
  if (error.status >= 500) return 'The server failed';
  return 'The request was refused';
}

type ErrorPanelProps = {
  error: unknown;
  title?: string;
  actions?: ReactNode;
  compact?: boolean;
};

/** Shows the API's own message (and its field issues) rather than a generic apology. */
export function ErrorPanel({ error, title, actions, compact }: ErrorPanelProps) {
  const message =
    error instanceof Error ? error.message : typeof error === 'string' ? error : 'Unknown error';
  const apiError = isApiError(error) ? error : null;
  return (
    <div
      role="alert"
      className={`rounded-lg border border-danger/40 bg-danger-soft ${compact ? 'p-3' : 'p-4'}`}
    >
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h2 className={`font-semibold text-danger ${compact ? 'text-sm' : 'text-base'}`}>
          {title ?? titleFor(error)}
        </h2>
        {apiError && (
          <span className="font-mono text-xs text-ink-muted">
            {apiError.status > 0 ? `${apiError.status} · ` : ''}
            {apiError.code}
          </span>
        )}
      </div>
      <p className="mt-1 text-sm text-ink">{message}</p>
      {apiError && apiError.issues.length > 0 && (
        <ul className="mt-2 space-y-0.5 text-[13px]">
          {apiError.issues.map((issue, index) => (
            <li key={index} className="flex gap-2">
              {issue.field && <code className="text-ink-muted">{issue.field}</code>}
              <span>{issue.message}</span>
            </li>
          ))}
        </ul>
      )}
      {actions && <div className="mt-3 flex flex-wrap gap-2">{actions}</div>}
    </div>
  );
}
