// The web links in a caught e-mail, so a tester can follow them from the mailbox page. The HTML part
// is shown in a sandboxed frame whose links cannot open, and the plain-text part has no links at all.
// Read with patterns rather than a DOM parser: it runs in unit tests under Node, and the mails are
// Railyard's own templates, not arbitrary HTML.

export type MailLink = {
  /** the link's text in the HTML part, or the words before it on its line in the plain text */
  label: string;
  /** the address as the mail has it */
  href: string;
  /** path, query and fragment of the address: the same page on the site the mailbox is read on */
  path: string;
  /**
   * Whether the mail points at another origin than that site: a server without PUBLIC_URL writes its
   * own address into mail, which is not the dev server's.
   */
  otherOrigin: boolean;
};

const namedEntities: Record<string, string> = {
  amp: '&',
  lt: '<',
  gt: '>',
  quot: '"',
  apos: "'",
  nbsp: '\u00a0',
};

function decodeEntities(value: string): string {
  return value.replace(/&(#x[0-9a-f]+|#[0-9]+|[a-z]+);/gi, (entity, body: string) => {
    if (body[0] === '#') {
      const code =
        body[1] === 'x' || body[1] === 'X'
          ? parseInt(body.slice(2), 16)
          : parseInt(body.slice(1), 10);
      return Number.isInteger(code) && code > 0 && code <= 0x10ffff
        ? String.fromCodePoint(code)
        : entity;
    }
    return namedEntities[body.toLowerCase()] ?? entity;
  });
}

function webUrl(raw: string): URL | null {
  try {
    const url = new URL(raw.trim());
    return url.protocol === 'http:' || url.protocol === 'https:' ? url : null;
  } catch {
    return null;
  }
}

const anchorPattern =
  /<a\b[^>]*?\bhref\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'>]+))[^>]*>([\s\S]*?)<\/a\s*>/gi;

function htmlLinks(html: string): { label: string; url: URL }[] {
  return [...html.matchAll(anchorPattern)].flatMap((match) => {
    const url = webUrl(decodeEntities(match[1] ?? match[2] ?? match[3] ?? ''));
    if (!url) return [];
    const label = decodeEntities((match[4] ?? '').replace(/<[^>]*>/g, ''))
      .replace(/\s+/g, ' ')
      .trim();
    return [{ label, url }];
  });
}

// A URL ends at white space or at a character that cannot end one in running text.
const textUrlPattern = /https?:\/\/[^\s<>"']+/g;
const trailingPunctuation = /[.,;:!?)\]]+$/;
const longestTextLabel = 60;

function textLinks(text: string): { label: string; url: URL }[] {
  return text.split('\n').flatMap((line) =>
    [...line.matchAll(textUrlPattern)].flatMap((match) => {
      const url = webUrl(match[0].replace(trailingPunctuation, ''));
      if (!url) return [];
      // The templates write "Read the comment: <url>"; a whole sentence before a URL is no label.
      const before = line
        .slice(0, match.index)
        .trim()
        .replace(/:$/, '')
        .replace(/^>\s*/, '')
        .trim();
      return [{ label: before.length <= longestTextLabel ? before : '', url }];
    }),
  );
}

function pathOf(url: URL): string {
  return `${url.pathname}${url.search}${url.hash}`;
}

/**
 * Every http(s) link of a mail, once each, HTML part first (its labels are the better ones), in the
 * order they appear. `siteOrigin` is the origin the mailbox is read on, e.g. `location.origin`.
 */
export function linksInMail(
  mail: { text: string; html: string | null },
  siteOrigin: string,
): MailLink[] {
  const seen = new Map<string, MailLink>();
  for (const { label, url } of [...htmlLinks(mail.html ?? ''), ...textLinks(mail.text)]) {
    const href = url.href;
    const known = seen.get(href);
    if (known) {
      if (!known.label) known.label = label;
      continue;
    }
    seen.set(href, { label, href, path: pathOf(url), otherOrigin: url.origin !== siteOrigin });
  }
  return [...seen.values()].map((link) => ({ ...link, label: link.label || link.path }));
}
