// The root is the rail power enters the board by; "Down from the root" and the way-from-the-root
// breadcrumbs start there. A moderator can move it to this rail.
import type { NetRow } from '@railyard/shared';
import { useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { ReasonField } from '../../../components/ui/reason-field';
import { isApiError } from '../../../lib/api-client';
import { reasonProblem } from '../../../lib/edit-reason';
import { useSetRootNet } from '../api/set-root-net';

type RootNetFormProps = { slug: string; net: NetRow; isRoot: boolean; rootNet: string | null };

export function RootNetForm({ slug, net, isRoot, rootNet }: RootNetFormProps) {
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | undefined>();
  const mutation = useSetRootNet(slug);
  const apiError = isApiError(mutation.error) ? mutation.error : null;

  if (isRoot) {
    return (
      <p className="text-[13px] text-ink-muted">
        <span className="font-mono text-lamp">{net.name}</span> is the board’s root: traces from the
        root start here.
      </p>
    );
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const problem = reasonProblem(reason);
    setReasonError(problem);
    if (problem) return;
    mutation.mutate({ net: net.name, reason: reason.trim() }, { onSuccess: () => setReason('') });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Board root" className="space-y-3">
      <p className="text-[13px] text-ink-muted">
        {rootNet ? (
          <>
            Traces from the root now start at <span className="font-mono text-ink">{rootNet}</span>.
          </>
        ) : (
          'The board has no root yet, so nothing can be traced from it.'
        )}
        {net.kind !== 'power' && (
          <span className="mt-1 block text-caution">
            {net.name} is a {net.kind} net; a root is normally the rail power enters the board by.
          </span>
        )}
      </p>
      <ReasonField
        value={reason}
        error={reasonError ?? apiError?.fieldErrors.reason}
        placeholder="e.g. battery connector is on a daughterboard"
        onChange={(value) => {
          setReason(value);
          setReasonError(undefined);
        }}
      />
      {apiError && !apiError.fieldErrors.reason && (
        <ErrorPanel compact error={mutation.error} title="The root was not changed" />
      )}
      <Button type="submit" size="sm" disabled={mutation.isPending}>
        {mutation.isPending ? 'Saving…' : `Make ${net.name} the root`}
      </Button>
    </form>
  );
}
