// The development server's caught mail: a recipient filter, the messages newest first, and the one
// picked shown in full. The list refreshes itself, so a tester can act in another tab and watch the
// mail arrive here.
import { useEffect, useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { formatDateTime } from '../../../lib/date-format';
import type { CaughtMail } from '@railyard/shared';
import { mailboxRefreshMs, useMailbox } from '../api/get-mailbox';
import { CaughtMailView } from './caught-mail-view';

const typingPause = 300;

const clockFormat = new Intl.DateTimeFormat('en-GB', {
  hour: '2-digit',
  minute: '2-digit',
  second: '2-digit',
  hourCycle: 'h23',
});

function NoMailbox() {
  return (
    <section
      aria-label="No local mailbox"
      className="rounded-lg border border-line bg-surface px-5 py-4"
    >
      <h2 className="text-base font-semibold">This server keeps no mailbox</h2>
      <p className="mt-1.5 text-sm text-ink-muted">
        It sends real e-mail through its mail server, so notifications land in people’s own inboxes
        and no copy is kept to read here. The mailbox exists only on a development server without a
        mail server configured.
      </p>
    </section>
  );
}

function EmptyMailbox({ to }: { to: string }) {
  return (
    <section
      aria-label="No mail"
      className="rounded-lg border border-dashed border-line-strong px-5 py-6 text-center"
    >
      <h2 className="text-sm font-semibold">
        {to ? (
          <>
            No mail to <span className="font-mono">{to}</span> yet
          </>
        ) : (
          'No mail caught yet'
        )}
      </h2>
      <p className="mx-auto mt-1.5 max-w-md text-[13px] text-ink-muted">
        Mail arrives when something happens to someone’s case: sign in as another person and comment
        on it, for instance. The server sends what is due on each round of its outbox worker
        (NOTIFY_INTERVAL_SECONDS, 30 by default), and someone on the daily digest gets theirs once a
        day. This page looks again every {mailboxRefreshMs / 1000} seconds.
      </p>
    </section>
  );
}

function MessageList({
  messages,
  selectedId,
  onSelect,
}: {
  messages: CaughtMail[];
  selectedId: number | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <ul aria-label="Caught mail, newest first" className="space-y-1">
      {messages.map((mail) => {
        const selected = mail.id === selectedId;
        return (
          <li key={mail.id}>
            <button
              type="button"
              aria-current={selected ? 'true' : undefined}
              onClick={() => onSelect(mail.id)}
              className={`block w-full rounded-md border px-3 py-2 text-left text-[13px] ${
                selected ? 'border-accent/60 bg-select' : 'border-line hover:border-line-strong'
              }`}
            >
              <span className="block truncate font-medium text-ink">
                {mail.subject || '(no subject)'}
              </span>
              <span className="mt-0.5 flex gap-2 text-xs text-ink-muted">
                <span className="min-w-0 flex-1 truncate font-mono">
                  {mail.envelopeTo.join(', ') || mail.to.join(', ')}
                </span>
                <time dateTime={mail.date ?? mail.receivedAt} className="shrink-0">
                  {formatDateTime(mail.date ?? mail.receivedAt)}
                </time>
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}

type MailboxViewProps = {
  /** the reader's own address, the filter's starting value; null when none, undefined until known */
  ownAddress: string | null | undefined;
};

export function MailboxView({ ownAddress }: MailboxViewProps) {
  // null until the reader types: the filter follows their own address until then.
  const [typed, setTyped] = useState<string | null>(null);
  const [settled, setSettled] = useState<string | null>(null);
  useEffect(() => {
    if (typed === null) return;
    const timer = setTimeout(() => setSettled(typed), typingPause);
    return () => clearTimeout(timer);
  }, [typed]);
  const fieldValue = typed ?? ownAddress ?? '';
  const to = (settled ?? ownAddress ?? '').trim();

  const mailbox = useMailbox(to, { enabled: ownAddress !== undefined });
  const [picked, setPicked] = useState<number | null>(null);

  const applyNow = (value: string) => {
    setTyped(value);
    setSettled(value);
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    applyNow(fieldValue);
  };

  const data = mailbox.data;
  if (data && !data.available) return <NoMailbox />;
  const messages = data?.messages ?? [];
  const selected = messages.find((mail) => mail.id === picked) ?? messages[0];

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-x-3 gap-y-2">
        <form
          role="search"
          onSubmit={submit}
          className="flex min-w-0 flex-1 basis-80 items-end gap-2"
        >
          <div className="flex w-full max-w-sm min-w-0 flex-col gap-1">
            <label htmlFor="mailbox-recipient" className="text-[13px] font-medium">
              Recipient
            </label>
            <input
              id="mailbox-recipient"
              type="search"
              inputMode="email"
              autoComplete="off"
              spellCheck={false}
              maxLength={320}
              placeholder="everyone"
              value={fieldValue}
              onChange={(event) => setTyped(event.target.value)}
              className={`${controlClass} h-8.5 font-mono`}
            />
          </div>
          {fieldValue !== '' && (
            <Button variant="ghost" onClick={() => applyNow('')}>
              Everyone
            </Button>
          )}
          {ownAddress && fieldValue.trim() !== ownAddress && (
            <Button variant="ghost" onClick={() => applyNow(ownAddress)}>
              Only mine
            </Button>
          )}
        </form>
        <div className="flex items-center gap-2">
          <p className="text-xs text-ink-faint">
            {mailbox.dataUpdatedAt > 0 &&
              `checked ${clockFormat.format(mailbox.dataUpdatedAt)}, again every ${mailboxRefreshMs / 1000} s`}
          </p>
          <Button
            onClick={() => void mailbox.refetch()}
            disabled={mailbox.isFetching || ownAddress === undefined}
          >
            {mailbox.isFetching ? 'Checking…' : 'Refresh'}
          </Button>
        </div>
      </div>

      {mailbox.isError && (
        <ErrorPanel
          compact
          error={mailbox.error}
          title="Could not read the mailbox"
          actions={
            <Button size="sm" onClick={() => void mailbox.refetch()}>
              Try again
            </Button>
          }
        />
      )}

      {!data ? (
        !mailbox.isError && (
          <div aria-busy="true" className="h-48 animate-pulse rounded-lg bg-surface">
            <span className="sr-only">Reading the mailbox…</span>
          </div>
        )
      ) : messages.length === 0 ? (
        <EmptyMailbox to={to} />
      ) : (
        <div
          className={`grid grid-cols-[minmax(0,1fr)] items-start gap-4 md:grid-cols-[19rem_minmax(0,1fr)] ${
            mailbox.isPlaceholderData ? 'opacity-60 transition-opacity' : ''
          }`}
        >
          <div>
            <p className="mb-1.5 text-xs text-ink-muted">
              {messages.length === 1 ? '1 message' : `${messages.length} messages`}
              {to ? ` to ${to}` : ''}
            </p>
            <MessageList messages={messages} selectedId={selected?.id} onSelect={setPicked} />
          </div>
          {selected && <CaughtMailView key={selected.id} mail={selected} />}
        </div>
      )}
    </div>
  );
}
