// Markdown of case write-ups and comments to safe HTML. Two layers: markdown-it never passes raw HTML
// (html: false) and refuses links outside an allow-list of schemes; then sanitize-html keeps only the
// tags and attributes markdown-it itself produces, so a parser bug cannot smuggle markup through.
// Net names and refdes of the case's board become links, placed on the token stream (never by
// rewriting HTML), so names inside code, inside links or inside longer words stay as written.
import MarkdownIt, { type MarkdownIt as MarkdownParser, type StateCore, type Token } from 'markdown-it';
import sanitizeHtml from 'sanitize-html';

export interface BoardNames {
  slug: string;
  /** printed net names and aliases of the board */
  nets: ReadonlySet<string>;
  refdes: ReadonlySet<string>;
}

const allowedSchemes = ['http', 'https', 'mailto'];

/**
 * The scheme a browser would see, lower-case, or null for a relative link. Browsers drop ASCII tabs and
 * newlines anywhere in a URL and leading control characters and spaces (WHATWG URL standard), and a
 * percent-encoded or entity-encoded scheme must not pass for a harmless one either.
 */
export function linkScheme(url: string): string | null {
  let decoded = url;
  try {
    decoded = decodeURIComponent(url);
  } catch {
    // a lone % is no escape: judge the text as written
  }
  const compact = decoded.replace(/[\u0000-\u0020\u007f-\u009f]/g, '').toLowerCase();
  return /^([a-z][a-z0-9+.-]*):/.exec(compact)?.[1] ?? null;
}

export function isAllowedLink(url: string): boolean {
  const scheme = linkScheme(url);
  return scheme === null || allowedSchemes.includes(scheme);
}

// A name is a run of letters, digits and _ + - . / # (USB_D+, RESET#, VSYS/VBAT); trailing sentence
// punctuation is not part of it. A run that is not a name as a whole is tried piece by piece
// between - . / (so "VSYS-GND" links both).
const nameRun = /[A-Za-z0-9_][A-Za-z0-9_+\-./#]*/g;
const trailingPunctuation = /[.,/]+$/;
const separators = /([-./])/;

export type NameKind = 'net' | 'component';
export interface TextSpan {
  text: string;
  kind?: NameKind;
}

/** Splits text into plain spans and spans that are names of the board, as `kindOf` decides. */
export function boardNameSpans(text: string, kindOf: (word: string) => NameKind | null): TextSpan[] {
  const spans: TextSpan[] = [];
  let plain = '';
  let last = 0;
  const flush = () => {
    if (plain !== '') spans.push({ text: plain });
    plain = '';
  };
  for (const match of text.matchAll(nameRun)) {
    const start = match.index;
    plain += text.slice(last, start);
    const run = match[0];
    const word = run.replace(trailingPunctuation, '');
    const tail = run.slice(word.length);
    last = start + run.length;
    const whole = word === '' ? null : kindOf(word);
    if (whole) {
      flush();
      spans.push({ text: word, kind: whole });
    } else {
      for (const piece of word.split(separators)) {
        const kind = piece === '' || separators.test(piece) ? null : kindOf(piece);
        if (kind) {
          flush();
          spans.push({ text: piece, kind });
        } else {
          plain += piece;
        }
      }
    }
    plain += tail;
  }
  plain += text.slice(last);
  flush();
  return spans;
}

/** Every word `boardNameSpans` could ask about: the names to look up on the board before rendering. */
export function nameCandidates(...texts: string[]): string[] {
  const asked = new Set<string>();
  for (const text of texts) {
    boardNameSpans(text, (word) => {
      asked.add(word);
      return null;
    });
  }
  return [...asked];
}

export function netHref(slug: string, net: string): string {
  return `/boards/${encodeURIComponent(slug)}/nets/${encodeURIComponent(net)}`;
}

export function componentHref(slug: string, refdes: string): string {
  return `/boards/${encodeURIComponent(slug)}/components/${encodeURIComponent(refdes)}`;
}

function linkBoardNames(state: StateCore): void {
  const names = (state.env as { boardNames?: BoardNames }).boardNames;
  if (!names) return;
  const kindOf = (word: string): NameKind | null =>
    names.nets.has(word) ? 'net' : names.refdes.has(word) ? 'component' : null;
  for (const block of state.tokens) {
    if (block.type !== 'inline' || !block.children) continue;
    const children: Token[] = [];
    let insideLink = 0;
    for (const token of block.children) {
      if (token.type === 'link_open') insideLink += 1;
      if (token.type === 'link_close') insideLink -= 1;
      if (token.type !== 'text' || insideLink > 0) {
        children.push(token);
        continue;
      }
      for (const span of boardNameSpans(token.content, kindOf)) {
        const text = new state.Token('text', '', 0);
        text.content = span.text;
        text.level = token.level;
        if (!span.kind) {
          children.push(text);
          continue;
        }
        const open = new state.Token('link_open', 'a', 1);
        open.attrs = [
          ['href', span.kind === 'net' ? netHref(names.slug, span.text) : componentHref(names.slug, span.text)],
          ['class', span.kind === 'net' ? 'net-link' : 'part-link'],
        ];
        open.level = token.level;
        text.level = token.level + 1;
        const close = new state.Token('link_close', 'a', -1);
        close.level = token.level;
        children.push(open, text, close);
      }
    }
    block.children = children;
  }
}

function createMarkdown(): MarkdownParser {
  const md = new MarkdownIt({ html: false, linkify: true, typographer: false });
  // pictures come as attachments, not as links to other sites (tracking pixels, mixed content)
  md.disable('image');
  // only links with a scheme or www.: "notes.md" or "board.json" in prose are not web addresses
  md.linkify.set({ fuzzyLink: false });
  const markdownItValidate = md.validateLink.bind(md);
  md.validateLink = (url: string) => markdownItValidate(url) && isAllowedLink(url);
  md.core.ruler.push('board_names', linkBoardNames);
  return md;
}

const markdown = createMarkdown();

const alignment = { 'text-align': [/^(left|right|center)$/] };
const sanitizeOptions: sanitizeHtml.IOptions = {
  allowedTags: [
    'p', 'br', 'hr', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6', 'blockquote', 'ul', 'ol', 'li', 'strong', 'em', 's',
    'code', 'pre', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td',
  ],
  allowedAttributes: { a: ['href', 'title', 'rel', 'class'], ol: ['start'], code: ['class'], th: ['style'], td: ['style'] },
  allowedClasses: { a: ['net-link', 'part-link'], code: ['language-*'] },
  allowedStyles: { th: alignment, td: alignment },
  allowedSchemes,
  allowedSchemesByTag: {},
  allowedSchemesAppliedToAttributes: ['href'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'escape',
  transformTags: { a: sanitizeHtml.simpleTransform('a', { rel: 'nofollow noopener noreferrer' }) },
};

/** The second layer on its own: whatever HTML comes in, only markdown-it's own tags and safe links go out. */
export function sanitizeCaseHtml(html: string): string {
  return sanitizeHtml(html, sanitizeOptions);
}

/** Safe HTML of a Markdown text; with `names`, the board's nets and parts written in it become links. */
export function renderCaseMarkdown(source: string, names?: BoardNames): string {
  if (source.trim() === '') return '';
  return sanitizeCaseHtml(markdown.render(source, { boardNames: names }));
}
