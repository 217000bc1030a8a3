// One caught message in full: who it went to, its HTML part as the recipient's mail program would
// show it, its plain-text part, and its links as links a tester can follow.
import type { CaughtMail } from '@railyard/shared';
import { Link } from 'react-router-dom';
import { formatDateTime } from '../../../lib/date-format';
import { mailHtmlHref } from '../api/get-mailbox';
import { linksInMail } from '../mail-links';

function sameAddresses(a: string[], b: string[]): boolean {
  const lower = (list: string[]) => [...new Set(list.map((x) => x.toLowerCase()))].sort().join(',');
  return lower(a) === lower(b);
}

function MailLinks({ mail }: { mail: CaughtMail }) {
  const links = linksInMail(mail, window.location.origin);
  return (
    <section aria-label="Links in this message" className="border-t border-line px-4 py-3">
      <h3 className="text-[13px] font-medium">Links in this message</h3>
      {links.length === 0 ? (
        <p className="mt-1 text-[13px] text-ink-muted">None.</p>
      ) : (
        <ul className="mt-1.5 space-y-1.5 text-[13px]">
          {links.map((link) => (
            <li key={link.href} className="min-w-0">
              <Link to={link.path} className="text-accent hover:underline">
                {link.label}
              </Link>
              {link.otherOrigin ? (
                <span className="block truncate text-xs text-ink-faint">
                  opens here; the mail points at{' '}
                  <a href={link.href} className="font-mono hover:underline">
                    {link.href}
                  </a>
                </span>
              ) : (
                <span className="block truncate font-mono text-xs text-ink-faint">{link.href}</span>
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

export function CaughtMailView({ mail }: { mail: CaughtMail }) {
  const envelopeDiffers = !sameAddresses(mail.to, mail.envelopeTo);
  return (
    <article
      aria-label={`Message: ${mail.subject || '(no subject)'}`}
      className="min-w-0 rounded-lg border border-line bg-surface"
    >
      <header className="border-b border-line px-4 pt-3 pb-2.5">
        <h2 className="text-base font-semibold break-words">{mail.subject || '(no subject)'}</h2>
        <dl className="mt-1.5 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-[13px]">
          <dt className="text-ink-muted">From</dt>
          <dd className="min-w-0 font-mono break-all">{mail.from || '—'}</dd>
          <dt className="text-ink-muted">To</dt>
          <dd className="min-w-0 font-mono break-all">{mail.to.join(', ') || '—'}</dd>
          {envelopeDiffers && (
            <>
              <dt className="text-ink-muted">Delivered to</dt>
              <dd className="min-w-0 font-mono break-all">{mail.envelopeTo.join(', ')}</dd>
            </>
          )}
          <dt className="text-ink-muted">Date</dt>
          <dd>
            <time dateTime={mail.date ?? mail.receivedAt}>
              {formatDateTime(mail.date ?? mail.receivedAt)}
            </time>
          </dd>
        </dl>
      </header>
      {mail.html !== null && (
        <section aria-label="HTML part" className="px-4 pt-3">
          <h3 className="mb-1.5 text-[13px] font-medium">HTML part</h3>
          {/* No scripts, forms, navigation or same-origin access: the frame only shows the mail,
              served with a policy of its own that lets its inline styles through. */}
          <iframe
            sandbox=""
            src={mailHtmlHref(mail.id)}
            title={`HTML part of ${mail.subject || 'the message'}`}
            referrerPolicy="no-referrer"
            className="h-72 w-full resize-y rounded-md border border-line bg-white"
          />
          <p className="mt-1 text-xs text-ink-faint">
            Shown as sent, in a frame that runs no scripts and loads nothing from elsewhere.
          </p>
        </section>
      )}
      <section aria-label="Text part" className="px-4 pt-3 pb-3">
        <h3 className="mb-1.5 text-[13px] font-medium">Text part</h3>
        <pre className="max-h-96 overflow-auto rounded-md border border-line bg-sunken px-3 py-2 font-mono text-[12.5px] leading-relaxed whitespace-pre-wrap break-words">
          {mail.text || '(empty)'}
        </pre>
      </section>
      <MailLinks mail={mail} />
    </article>
  );
}
