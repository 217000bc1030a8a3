// The power links at this rail as stored: where each came from (derived from the netlist or entered
// by someone), and a way to remove one, confirmed with a reason.
import type { PowerLinkRow } from '@railyard/shared';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { ReasonField } from '../../../components/ui/reason-field';
import { paths } from '../../../config/paths';
import { reasonProblem } from '../../../lib/edit-reason';
import { usePowerLinks } from '../api/get-power-links';
import { useRemovePowerLink } from '../api/remove-power-link';
import { linkKindHint, linkKindLabel, PowerLinkGlyph } from './power-link-glyph';

/** "derived from the netlist", "entered in the annotations", "entered by you", "entered by user #12". */
function originText(link: PowerLinkRow, currentUserId: number | null): string {
  if (link.origin === 'derived') return 'derived from the netlist';
  const by = link.enteredBy ?? '';
  // The API names the source as "import:<…>" for an annotations file, "user:<id>" for a person.
  if (by === '' || by.startsWith('import:')) return 'entered in the annotations';
  const id = /^user:(\d+)$/.exec(by)?.[1];
  if (id === undefined) return `entered by ${by}`;
  return Number(id) === currentUserId ? 'entered by you' : `entered by user #${id}`;
}

function End({ slug, net, rail }: { slug: string; net: string; rail: string }) {
  if (net === rail) return <span className="font-semibold text-lamp">{net}</span>;
  return (
    <Link to={paths.net.getHref(slug, net)} className="text-ink hover:text-accent hover:underline">
      {net}
    </Link>
  );
}

function RemoveLinkForm({
  slug,
  link,
  onDone,
}: {
  slug: string;
  link: PowerLinkRow;
  onDone: () => void;
}) {
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | undefined>();
  const mutation = useRemovePowerLink(slug);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const problem = reasonProblem(reason);
    setReasonError(problem);
    if (problem) return;
    mutation.mutate({ id: link.id, reason: reason.trim() }, { onSuccess: onDone });
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={`Remove ${link.from} → ${link.to} via ${link.via}`}
      className="mt-1.5 space-y-2 rounded-md border border-danger/40 bg-danger-soft p-2.5"
    >
      <p className="text-[13px]">
        Remove this link? Traces stop following it at once.
        {link.origin === 'derived' && (
          <span className="text-ink-muted">
            {' '}
            A link derived from the netlist may come back when the netlist is imported again.
          </span>
        )}
      </p>
      <ReasonField
        label="Why remove it"
        value={reason}
        error={reasonError}
        autoFocus
        onChange={(value) => {
          setReason(value);
          setReasonError(undefined);
        }}
      />
      {mutation.isError && <ErrorPanel compact error={mutation.error} title="Not removed" />}
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="danger" disabled={mutation.isPending}>
          {mutation.isPending ? 'Removing…' : 'Remove the link'}
        </Button>
        <Button size="sm" variant="ghost" onClick={onDone}>
          Keep it
        </Button>
      </div>
    </form>
  );
}

type RailLinksEditorProps = { slug: string; rail: string; currentUserId: number | null };

export function RailLinksEditor({ slug, rail, currentUserId }: RailLinksEditorProps) {
  const query = usePowerLinks(slug, rail);
  const [removing, setRemoving] = useState<number | null>(null);
  const links = query.data?.links;

  return (
    <div className="space-y-3">
      {query.isError ? (
        <ErrorPanel
          compact
          error={query.error}
          title="Could not list the power links"
          actions={
            <Button size="sm" onClick={() => void query.refetch()}>
              Try again
            </Button>
          }
        />
      ) : !links ? (
        <p className="animate-pulse text-[13px] text-ink-muted">Listing the power links…</p>
      ) : links.length === 0 ? (
        <p className="text-[13px] text-ink-muted">No power link starts or ends at {rail}.</p>
      ) : (
        <ul aria-label={`Power links of ${rail}`} className="space-y-1">
          {links.map((link) => (
            <li key={link.id} aria-label={`${link.from} → ${link.to} via ${link.via}`}>
              <div className="grid grid-cols-[1.5rem_minmax(0,1fr)_auto] items-center gap-x-2 text-[13px]">
                <span title={`${linkKindLabel[link.kind]}: ${linkKindHint[link.kind]}`}>
                  <PowerLinkGlyph kind={link.kind} width={22} />
                </span>
                <span className="min-w-0 truncate font-mono">
                  <End slug={slug} net={link.from} rail={rail} />
                  <span className="mx-1 text-ink-faint">→</span>
                  <End slug={slug} net={link.to} rail={rail} />
                </span>
                <Button
                  size="sm"
                  variant="ghost"
                  aria-label={`Remove ${link.from} → ${link.to} via ${link.via}`}
                  aria-expanded={removing === link.id}
                  onClick={() => setRemoving(removing === link.id ? null : link.id)}
                  className="h-6 px-1.5 text-xs"
                >
                  Remove
                </Button>
                <span />
                <span className="col-span-2 text-xs text-ink-muted">
                  via <span className="font-mono text-ink">{link.via}</span> ·{' '}
                  {linkKindLabel[link.kind]} ·{' '}
                  <span className={link.origin === 'entered' ? 'text-accent' : ''}>
                    {originText(link, currentUserId)}
                  </span>
                </span>
              </div>
              {removing === link.id && (
                <RemoveLinkForm slug={slug} link={link} onDone={() => setRemoving(null)} />
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
