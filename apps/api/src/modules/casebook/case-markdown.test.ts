import { describe, expect, it } from 'vitest';
import { boardNameSpans, linkScheme, nameCandidates, renderCaseMarkdown, sanitizeCaseHtml, type BoardNames } from './case-markdown';

const board: BoardNames = {
  slug: 'demo-board',
  nets: new Set(['VSYS', 'VBAT', 'VCC_3V3', 'USB_D+', 'SYS']),
  refdes: new Set(['C1012', 'U2001', 'L2001']),
};

/** Every href in the HTML resolves to http, https or mailto (relative links resolve to the site's https). */
function expectOnlySafeLinks(html: string) {
  for (const [, href] of html.matchAll(/href="([^"]*)"/g)) {
    expect(new URL(href!.replaceAll('&amp;', '&'), 'https://railyard.invalid').protocol).toMatch(/^(https?|mailto):$/);
  }
}

const safeTags = new Set(['p', 'br', 'hr', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6', 'blockquote', 'ul', 'ol', 'li', 'strong', 'em', 's', 'code', 'pre', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td']);
const safeAttributes = new Set(['href', 'title', 'rel', 'class', 'start']);

/** Every tag is well formed, of the few markdown-it makes, with only inert attributes; every link is safe. */
function expectHarmless(html: string) {
  const tag = /<\/?([a-z][a-z0-9]*)((?:\s+[a-z-]+="[^"<>]*")*)\s*>/gi;
  // anything that starts like a tag but is not one of these well-formed tags would be a parser escape
  expect(html.replace(tag, '')).not.toMatch(/<[a-z!/?]/i);
  for (const [, name, attributes] of html.matchAll(tag)) {
    expect(safeTags).toContain(name!.toLowerCase());
    for (const [, attribute] of attributes!.matchAll(/([a-z-]+)="/gi)) expect(safeAttributes).toContain(attribute!.toLowerCase());
  }
  expectOnlySafeLinks(html);
}

// Vectors from the OWASP XSS Filter Evasion Cheat Sheet (cheatsheetseries.owasp.org/cheatsheets/
// XSS_Filter_Evasion_Cheat_Sheet.html), as raw HTML in Markdown and as Markdown links.
const rawHtmlVectors = [
  '<SCRIPT SRC=https://xss.example/xss.js></SCRIPT>',
  '<IMG SRC="javascript:alert(\'XSS\');">',
  '<IMG SRC=JaVaScRiPt:alert(\'XSS\')>',
  '<IMG SRC=&#106;&#97;&#118;&#97;&#115;&#99;&#114;&#105;&#112;&#116;&#58;&#97;&#108;&#101;&#114;&#116;&#40;&#39;&#88;&#83;&#83;&#39;&#41;>',
  '<IMG SRC="jav&#x09;ascript:alert(\'XSS\');">',
  '<IMG SRC=/ onerror="alert(String.fromCharCode(88,83,83))"></img>',
  '<svg/onload=alert(\'XSS\')>',
  '<BODY ONLOAD=alert(\'XSS\')>',
  '<IFRAME SRC="javascript:alert(\'XSS\');"></IFRAME>',
  '<a onmouseover="alert(document.cookie)">xxs link</a>',
  '<STYLE>li {list-style-image: url("javascript:alert(\'XSS\')");}</STYLE><UL><LI>XSS</br>',
  '<<SCRIPT>alert("XSS");//\\<</SCRIPT>',
];
const markdownLinkVectors = [
  '[x](javascript:alert(1))',
  '[x](JaVaScRiPt:alert(1))',
  '[x](  javascript:alert(1))',
  '[x](&#106;avascript:alert(1))',
  '[x](&#x6A;&#x61;vascript:alert(1))',
  '[x](jav&#x09;ascript:alert(1))',
  '[x](javascript&#58;alert(1))',
  '[x](%6A%61vascript:alert(1))',
  '[x](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)',
  '[x](vbscript:msgbox(1))',
  '[x](file:///etc/passwd)',
  '<javascript:alert(1)>',
  '<JAVASCRIPT:alert(1)>',
  '[x][evil]\n\n[evil]: javascript:alert(1)',
  '![x](javascript:alert(1))',
  '[x](https://example.com "\\" onmouseover=\\"alert(1)")',
];

describe('Markdown of case write-ups', () => {
  it.each(rawHtmlVectors)('shows raw HTML as text: %s', (vector) => {
    const html = renderCaseMarkdown(vector);
    expectHarmless(html);
    expect(html).toContain('&lt;');
  });

  it.each(markdownLinkVectors)('makes no dangerous link of %s', (vector) => {
    expectHarmless(renderCaseMarkdown(vector));
  });

  it('refuses data: image links, which markdown-it alone lets through', () => {
    const html = renderCaseMarkdown('[pixel](data:image/png;base64,iVBORw0KGgo=)');
    expect(html).not.toContain('href');
  });

  it('decodes entities in text once, so an encoded tag stays visible text', () => {
    expect(renderCaseMarkdown('&#60;script&#62;alert(1)&#60;/script&#62;')).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;</p>\n');
  });

  it('keeps ordinary links, with rel="nofollow noopener noreferrer"', () => {
    expect(renderCaseMarkdown('[guide](https://example.com/guide) and <mailto:tech@example.com>')).toBe(
      '<p><a href="https://example.com/guide" rel="nofollow noopener noreferrer">guide</a> and ' +
        '<a href="mailto:tech@example.com" rel="nofollow noopener noreferrer">mailto:tech@example.com</a></p>\n',
    );
  });

  it('links bare web addresses but not file names that look like domains', () => {
    const html = renderCaseMarkdown('See https://example.com/a?b=c and notes.md');
    expect(html).toContain('<a href="https://example.com/a?b=c" rel="nofollow noopener noreferrer">https://example.com/a?b=c</a>');
    expect(html).toContain('and notes.md</p>');
  });

  it('keeps lists, tables with alignment and fenced code with its language', () => {
    const html = renderCaseMarkdown('1. one\n2. two\n\n| a | b |\n|--:|:-:|\n| 1 | 2 |\n\n```js\nalert(1)\n```');
    expect(html).toContain('<ol>');
    expect(html).toContain('<th style="text-align:right">a</th>');
    expect(html).toContain('<pre><code class="language-js">alert(1)\n</code></pre>');
  });
});

describe('the second layer, sanitize-html, on HTML a parser bug might let through', () => {
  it('strips scripts, event handlers, images and javascript: links', () => {
    const html = sanitizeCaseHtml(
      '<p onclick="alert(1)">a</p><a href="javascript:alert(1)">b</a><img src=x onerror=alert(1)><script>alert(1)</script>' +
        '<a href="https://example.com" target="_blank">c</a><code class="language-js evil">d</code>',
    );
    expectHarmless(html);
    expect(html).toContain('<p>a</p>');
    expect(html).toContain('<a rel="nofollow noopener noreferrer">b</a>');
    expect(html).toContain('<a href="https://example.com" rel="nofollow noopener noreferrer">c</a>');
    expect(html).toContain('<code class="language-js">d</code>');
  });
});

describe('links to the board’s nets and parts', () => {
  it('links names written in the text to the net’s page and the part’s page', () => {
    const html = renderCaseMarkdown('VSYS shorted; replaced C1012 next to U2001.', board);
    expect(html).toBe(
      '<p><a href="/boards/demo-board/nets/VSYS" class="net-link" rel="nofollow noopener noreferrer">VSYS</a> shorted; replaced ' +
        '<a href="/boards/demo-board/components/C1012" class="part-link" rel="nofollow noopener noreferrer">C1012</a> next to ' +
        '<a href="/boards/demo-board/components/U2001" class="part-link" rel="nofollow noopener noreferrer">U2001</a>.</p>\n',
    );
  });

  it('leaves names in code, inside links and inside longer words as they are', () => {
    const html = renderCaseMarkdown('`VSYS` and [VSYS notes](https://example.com/VSYS) and VSYS2 and XVSYS', board);
    expect(html).not.toContain('net-link');
  });

  it('finds names joined by - / . and names ending in + as written', () => {
    const html = renderCaseMarkdown('VSYS-VBAT short, VCC_3V3/VSYS and USB_D+.', board);
    expect([...html.matchAll(/class="net-link"[^>]*>([^<]+)</g)].map((m) => m[1])).toEqual(['VSYS', 'VBAT', 'VCC_3V3', 'VSYS', 'USB_D+']);
    expect(html).toContain('href="/boards/demo-board/nets/USB_D%2B"');
  });

  it('links names in headings, emphasis, list items and table cells', () => {
    const html = renderCaseMarkdown('## L2001 hot\n\n- **VBAT** low\n\n| net |\n|---|\n| VCC_3V3 |', board);
    expect(html.match(/-link"/g)).toHaveLength(3);
  });

  it('splits text into plain and name spans that join back to the text', () => {
    const kindOf = (w: string) => (board.nets.has(w) ? 'net' : board.refdes.has(w) ? 'component' : null);
    const text = 'Near L2001, VSYS-VBAT.';
    const spans = boardNameSpans(text, kindOf);
    expect(spans.map((s) => s.text).join('')).toBe(text);
    expect(spans.filter((s) => s.kind)).toEqual([
      { text: 'L2001', kind: 'component' },
      { text: 'VSYS', kind: 'net' },
      { text: 'VBAT', kind: 'net' },
    ]);
  });

  it('asks about every word that could be a name, and its pieces', () => {
    expect(nameCandidates('VSYS-VBAT, C12.')).toEqual(['VSYS-VBAT', 'VSYS', 'VBAT', 'C12']);
  });
});

describe('link schemes', () => {
  it.each([
    ['https://example.com', 'https'],
    ['MAILTO:tech@example.com', 'mailto'],
    ['JaVaScRiPt:alert(1)', 'javascript'],
    ['jav\tascript:alert(1)', 'javascript'],
    ['\u0001 javascript:alert(1)', 'javascript'],
    ['%6A%61vascript:alert(1)', 'javascript'],
    ['/boards/demo-board/nets/VSYS', null],
    ['notes#part-2', null],
  ])('reads the scheme of %j as %j', (url, scheme) => {
    expect(linkScheme(url)).toBe(scheme);
  });
});
