// The e-mails: a plain-text part and a small HTML part for each kind. Everything in a payload came from
// people (titles, names, comments), so every value is escaped in the HTML and stripped of control
// characters in the text and the subject.
import type { DigestItem, NotificationEvent, NotificationMessage } from './notification-kinds';

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

export interface TemplateContext {
  /** the address people open, without a trailing slash, e.g. https://railyard.example */
  baseUrl: string;
  recipientName: string;
}

/** Pages of the web client the mails link to. */
export const mailLinks = {
  case: (caseId: number) => `/cases/${caseId}`,
  comment: (caseId: number, commentId: number) => `/cases/${caseId}#comment-${commentId}`,
  settings: '/settings/notifications',
};

const htmlEscapes: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** HTML text and attribute escaping (the five characters of the HTML spec's "escaping a string"). */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => htmlEscapes[c]!);
}

// C0 controls except tab and newline, DEL and C1 controls: they have no business in a mail
const controlCharacters = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g;

function plain(value: string): string {
  return value.replace(controlCharacters, '');
}

/** Subjects are one line: a newline there would be a header-injection attempt or a mistake. */
function oneLine(value: string, max = 150): string {
  const line = plain(value).replace(/\s+/g, ' ').trim();
  return line.length > max ? `${line.slice(0, max - 1)}…` : line;
}

function shorten(value: string, max: number): string {
  const text = plain(value).trim();
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}

interface Section {
  /** one sentence saying what happened */
  headline: string;
  /** optional quoted text (a comment, a reason) */
  quote?: string;
  link: { label: string; path: string };
}

function sectionFor(event: NotificationEvent): Section {
  switch (event.kind) {
    case 'case_commented': {
      const p = event.payload;
      return {
        headline: `${oneLine(p.commenterName)} commented on your case "${oneLine(p.caseTitle)}".`,
        quote: shorten(p.excerpt, 400),
        link: { label: 'Read the comment', path: mailLinks.comment(p.caseId, p.commentId) },
      };
    }
    case 'case_confirmed': {
      const p = event.payload;
      return {
        headline: `${oneLine(p.confirmedByName)} confirmed the fix in your case "${oneLine(p.caseTitle)}".`,
        quote: p.note ? shorten(p.note, 400) : undefined,
        link: { label: 'Open the case', path: mailLinks.case(p.caseId) },
      };
    }
    case 'case_merged': {
      const p = event.payload;
      return {
        headline: `${oneLine(p.mergedByName)} merged your case "${oneLine(p.caseTitle)}" into "${oneLine(p.intoCaseTitle)}".`,
        quote: p.reason ? shorten(p.reason, 400) : undefined,
        link: { label: 'Open the merged case', path: mailLinks.case(p.intoCaseId) },
      };
    }
    case 'content_flagged': {
      const p = event.payload;
      const what =
        p.target === 'comment'
          ? `A comment on the case "${oneLine(p.caseTitle)}"`
          : `The case "${oneLine(p.caseTitle)}"`;
      return {
        headline: `${what} was flagged by ${oneLine(p.flaggedByName)}.`,
        quote: shorten(p.reason, 400),
        link: {
          label: 'Review it',
          path:
            p.target === 'comment' && p.commentId
              ? mailLinks.comment(p.caseId, p.commentId)
              : mailLinks.case(p.caseId),
        },
      };
    }
  }
}

function subjectFor(event: NotificationEvent): string {
  switch (event.kind) {
    case 'case_commented':
      return `New comment on "${event.payload.caseTitle}"`;
    case 'case_confirmed':
      return `Your fix in "${event.payload.caseTitle}" was confirmed`;
    case 'case_merged':
      return `"${event.payload.caseTitle}" was merged into "${event.payload.intoCaseTitle}"`;
    case 'content_flagged':
      return `Flagged for review: "${event.payload.caseTitle}"`;
  }
}

function absolute(ctx: TemplateContext, path: string): string {
  return `${ctx.baseUrl.replace(/\/+$/, '')}${path}`;
}

function sectionText(ctx: TemplateContext, s: Section): string {
  const lines = [s.headline];
  if (s.quote) lines.push('', ...s.quote.split('\n').map((l) => `> ${l}`));
  lines.push('', `${s.link.label}: ${absolute(ctx, s.link.path)}`);
  return lines.join('\n');
}

function sectionHtml(ctx: TemplateContext, s: Section): string {
  const quote = s.quote
    ? `<blockquote style="margin:8px 0;padding-left:12px;border-left:3px solid #999">${escapeHtml(s.quote).replace(/\n/g, '<br>')}</blockquote>`
    : '';
  return `<p>${escapeHtml(s.headline)}</p>${quote}<p><a href="${escapeHtml(absolute(ctx, s.link.path))}">${escapeHtml(s.link.label)}</a></p>`;
}

function footerText(ctx: TemplateContext): string {
  return `You get these e-mails from Railyard because of your notification settings: ${absolute(ctx, mailLinks.settings)}`;
}

function wrapHtml(ctx: TemplateContext, body: string): string {
  return [
    '<!doctype html><html><body style="font-family:sans-serif;line-height:1.4">',
    `<p>Hello ${escapeHtml(oneLine(ctx.recipientName))},</p>`,
    body,
    `<p style="color:#666;font-size:12px">You get these e-mails from Railyard because of your <a href="${escapeHtml(absolute(ctx, mailLinks.settings))}">notification settings</a>.</p>`,
    '</body></html>',
  ].join('');
}

function digestItemEvent(item: DigestItem): NotificationEvent {
  return { kind: item.kind, payload: item.payload } as NotificationEvent;
}

export function renderNotification(
  message: NotificationMessage,
  ctx: TemplateContext,
): RenderedMail {
  const greeting = `Hello ${oneLine(ctx.recipientName)},`;
  if (message.kind === 'digest') {
    const sections = message.payload.items.map((item) => sectionFor(digestItemEvent(item)));
    const count = sections.length;
    return {
      subject: oneLine(`Railyard: ${count} ${count === 1 ? 'update' : 'updates'} on your cases`),
      text: [
        greeting,
        '',
        `Here is what happened since your last digest:`,
        '',
        sections.map((s) => sectionText(ctx, s)).join('\n\n---\n\n'),
        '',
        footerText(ctx),
      ].join('\n'),
      html: wrapHtml(
        ctx,
        `<p>Here is what happened since your last digest:</p>${sections.map((s) => sectionHtml(ctx, s)).join('<hr>')}`,
      ),
    };
  }
  const section = sectionFor(message);
  return {
    subject: oneLine(subjectFor(message)),
    text: [greeting, '', sectionText(ctx, section), '', footerText(ctx)].join('\n'),
    html: wrapHtml(ctx, sectionHtml(ctx, section)),
  };
}
