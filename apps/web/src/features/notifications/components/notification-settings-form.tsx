// The choice of how Railyard e-mails someone, and where it goes. The server reads the choice when a
// mail is due, not when the event happens, so a change also applies to mail still waiting.
import { notificationModes, type NotificationMode } from '@railyard/shared';
import { useId, useState, type FormEvent } from 'react';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { Button } from '../../../components/ui/button';
import { useNotificationSettings } from '../api/get-notification-settings';
import { useUpdateNotificationSettings } from '../api/update-notification-settings';

const modeChoices: Record<NotificationMode, { label: string; text: string }> = {
  off: {
    label: 'Off',
    text: 'No e-mail at all. What happens meanwhile is not saved up: turning mail on again later does not send it.',
  },
  immediate: {
    label: 'Each as it happens',
    text: 'One e-mail per event, usually within a minute of it.',
  },
  daily_digest: {
    label: 'One daily digest',
    text: 'At most one e-mail a day, listing everything since the previous digest. No news, no mail.',
  },
};

function AddressPanel({ email }: { email: string | null }) {
  if (email === null) {
    return (
      <section
        aria-label="No address to send to"
        className="rounded-lg border border-caution/40 bg-caution-soft px-4 py-3 text-[13px]"
      >
        <h2 className="font-semibold text-caution">No verified e-mail address</h2>
        <p className="mt-1 text-ink">
          Your GitHub account gave Railyard no verified primary address, so nothing can be sent,
          whichever choice you make below. Verify an address on GitHub, make it the primary one,
          then sign out and in again.
        </p>
      </section>
    );
  }
  return (
    <section
      aria-label="Where mail goes"
      className="rounded-lg border border-line bg-surface px-4 py-3 text-[13px]"
    >
      <p>
        Mail goes to <span className="font-mono text-ink">{email}</span>
      </p>
      <p className="mt-1 text-ink-muted">
        The verified primary address of your GitHub account, taken again each time you sign in.
      </p>
    </section>
  );
}

function WhatIsSent({ moderates }: { moderates: boolean }) {
  return (
    <section aria-labelledby="what-is-sent" className="text-[13px]">
      <h2 id="what-is-sent" className="font-medium">
        What you are told about
      </h2>
      <ul className="mt-1.5 list-disc space-y-0.5 pl-5 text-ink-muted">
        <li>a comment on a case you wrote up (not your own comments)</li>
        <li>someone confirming the fix in a case of yours</li>
        <li>a moderator merging a case of yours into another one</li>
        <li>
          {moderates
            ? 'a case or comment someone flagged for review (you moderate, so you get these)'
            : 'moderators and admins also hear of cases and comments flagged for review'}
        </li>
      </ul>
    </section>
  );
}

type NotificationSettingsFormProps = {
  userId: number;
  /** moderators and admins are also mailed about flagged content */
  moderates: boolean;
};

export function NotificationSettingsForm({ userId, moderates }: NotificationSettingsFormProps) {
  const { data: settings } = useNotificationSettings(userId);
  const update = useUpdateNotificationSettings(userId);
  const [choice, setChoice] = useState<NotificationMode>(settings.mode);
  const changed = choice !== settings.mode;
  const id = useId();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    update.mutate(choice);
  };

  return (
    <div className="space-y-5">
      <AddressPanel email={settings.email} />
      <WhatIsSent moderates={moderates} />
      <form onSubmit={submit} className="space-y-3">
        <fieldset>
          <legend className="text-[13px] font-medium">How you get it</legend>
          <div className="mt-1.5 space-y-1.5">
            {notificationModes.map((mode) => (
              <label
                key={mode}
                className={`flex cursor-pointer items-start gap-2.5 rounded-md border px-3 py-2 text-[13px] ${
                  choice === mode
                    ? 'border-accent/60 bg-select'
                    : 'border-line hover:border-line-strong'
                }`}
              >
                <input
                  type="radio"
                  name="mode"
                  value={mode}
                  checked={choice === mode}
                  onChange={() => {
                    setChoice(mode);
                    update.reset();
                  }}
                  aria-labelledby={`${id}-${mode}-label`}
                  aria-describedby={`${id}-${mode}-text${mode === settings.mode ? ` ${id}-${mode}-saved` : ''}`}
                  className="mt-0.5 accent-(--ry-accent)"
                />
                <span className="min-w-0 flex-1">
                  <span id={`${id}-${mode}-label`} className="font-medium text-ink">
                    {modeChoices[mode].label}
                  </span>
                  <span id={`${id}-${mode}-text`} className="mt-0.5 block text-ink-muted">
                    {modeChoices[mode].text}
                  </span>
                </span>
                {mode === settings.mode && (
                  <span id={`${id}-${mode}-saved`} className="text-xs text-ink-faint">
                    current
                  </span>
                )}
              </label>
            ))}
          </div>
        </fieldset>
        {update.isError && (
          <ErrorPanel compact error={update.error} title="The choice was not saved" />
        )}
        <div className="flex items-center gap-3">
          <Button type="submit" variant="primary" disabled={!changed || update.isPending}>
            {update.isPending ? 'Saving…' : 'Save'}
          </Button>
          <p role="status" className="text-[13px] text-ink-muted">
            {update.isSuccess && !changed
              ? `Saved: ${modeChoices[settings.mode].label.toLowerCase()}.`
              : changed
                ? 'Not saved yet. Mail still waiting follows the choice once saved.'
                : ''}
          </p>
        </div>
      </form>
    </div>
  );
}
