// The HTML parts are read back with htmlparser2 (the parser sanitize-html is built on), so the checks
// ask what a browser-like tokenizer sees, not whether a string happens to contain "&lt;".
import { parseDocument, DomUtils } from 'htmlparser2';
import { describe, expect, it } from 'vitest';
import type { NotificationMessage } from './notification-kinds';
import { escapeHtml, renderNotification } from './notification-templates';

const ctx = { baseUrl: 'https://railyard.example', recipientName: 'Dana' };
const hostile = `<img src=x onerror="alert(1)"> & <script>steal()</script> 'quoted'`;

function elements(html: string) {
  const doc = parseDocument(html);
  return DomUtils.findAll(() => true, doc.children).map((e) => e.name);
}

function textOf(html: string): string {
  return DomUtils.textContent(parseDocument(html, { decodeEntities: true }));
}

function links(html: string): string[] {
  return DomUtils.findAll((e) => e.name === 'a', parseDocument(html).children).map(
    (e) => e.attribs.href!,
  );
}

const commented: NotificationMessage = {
  kind: 'case_commented',
  payload: {
    caseId: 12,
    caseTitle: 'No power, VSYS shorted to GND',
    commentId: 345,
    commenterName: 'Rene',
    excerpt: 'Check C212 first: it read 0.002 V in diode mode.',
  },
};

describe('escapeHtml', () => {
  it('turns the five special characters into references a parser decodes back to the original', () => {
    const escaped = escapeHtml(hostile);
    expect(escaped).not.toMatch(/[<>"']/);
    // HTML spec, named and numeric character references: &amp; &lt; &gt; &quot; &#39;
    expect(textOf(`<p title="${escaped}">${escaped}</p>`)).toBe(hostile);
    expect(parseDocument(`<p title="${escaped}"></p>`).children.length).toBe(1);
    expect(
      DomUtils.findOne((e) => e.name === 'p', parseDocument(`<p title="${escaped}"></p>`).children)!
        .attribs.title,
    ).toBe(hostile);
  });
});

describe('renderNotification', () => {
  it('tells the case author who commented, quotes the comment and links to it', () => {
    const mail = renderNotification(commented, ctx);
    expect(mail.subject).toBe('New comment on "No power, VSYS shorted to GND"');
    expect(mail.text).toContain('Rene commented on your case "No power, VSYS shorted to GND".');
    expect(mail.text).toContain('> Check C212 first: it read 0.002 V in diode mode.');
    expect(mail.text).toContain('Read the comment: https://railyard.example/cases/12#comment-345');
    expect(links(mail.html)).toContain('https://railyard.example/cases/12#comment-345');
    expect(links(mail.html)).toContain('https://railyard.example/settings/notifications');
  });

  it.each<NotificationMessage>([
    {
      kind: 'case_commented',
      payload: {
        caseId: 1,
        caseTitle: hostile,
        commentId: 2,
        commenterName: hostile.slice(0, 90),
        excerpt: hostile,
      },
    },
    {
      kind: 'case_confirmed',
      payload: { caseId: 1, caseTitle: hostile, confirmedByName: 'Kim', note: hostile },
    },
    {
      kind: 'case_merged',
      payload: {
        caseId: 1,
        caseTitle: hostile,
        intoCaseId: 3,
        intoCaseTitle: hostile,
        mergedByName: 'Kim',
        reason: hostile,
      },
    },
    {
      kind: 'content_flagged',
      payload: {
        caseId: 1,
        caseTitle: hostile,
        target: 'comment',
        commentId: 9,
        flaggedByName: 'Kim',
        reason: hostile,
      },
    },
  ])('puts people-written text of a $kind mail into the HTML as text only', (message) => {
    const mail = renderNotification(message, { ...ctx, recipientName: hostile.slice(0, 90) });
    const tags = new Set(elements(mail.html));
    expect(
      [...tags].filter((t) => !['html', 'body', 'p', 'a', 'blockquote', 'br', 'hr'].includes(t)),
    ).toEqual([]);
    expect(textOf(mail.html)).toContain("<script>steal()</script> 'quoted'");
  });

  it('keeps the subject on one line whatever the title holds', () => {
    const mail = renderNotification(
      {
        ...commented,
        payload: { ...commented.payload, caseTitle: 'VBAT\r\nBcc: someone@example.com\u0007' },
      },
      ctx,
    );
    expect(mail.subject).toBe('New comment on "VBAT Bcc: someone@example.com"');
    expect(mail.subject).not.toMatch(/[\r\n]/);
  });

  it('links a merge to the case it was merged into', () => {
    const mail = renderNotification(
      {
        kind: 'case_merged',
        payload: {
          caseId: 5,
          caseTitle: 'Dead after liquid damage',
          intoCaseId: 3,
          intoCaseTitle: 'Corroded VCC_3V3 filter',
          mergedByName: 'Moderator Ann',
        },
      },
      ctx,
    );
    expect(mail.subject).toBe(
      '"Dead after liquid damage" was merged into "Corroded VCC_3V3 filter"',
    );
    expect(links(mail.html)[0]).toBe('https://railyard.example/cases/3');
  });

  it('sums up every item of a digest in one mail', () => {
    const mail = renderNotification(
      {
        kind: 'digest',
        payload: {
          day: '2026-03-10T07:00:00.000Z',
          items: [
            { id: 1, createdAt: '2026-03-09T10:00:00.000Z', ...commented },
            {
              id: 2,
              createdAt: '2026-03-09T11:00:00.000Z',
              kind: 'case_confirmed',
              payload: {
                caseId: 12,
                caseTitle: 'No power, VSYS shorted to GND',
                confirmedByName: 'Lee',
              },
            },
          ],
        },
      } as NotificationMessage,
      ctx,
    );
    expect(mail.subject).toBe('Railyard: 2 updates on your cases');
    expect(mail.text).toContain('Rene commented on your case');
    expect(mail.text).toContain('Lee confirmed the fix in your case');
    expect(links(mail.html).filter((l) => l.includes('/cases/12'))).toHaveLength(2);
  });
});
