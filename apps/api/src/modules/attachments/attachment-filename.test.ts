import { parse } from 'content-disposition';
import { describe, expect, it } from 'vitest';
import { cleanFileName, contentDisposition } from './attachment-filename';

describe('cleanFileName', () => {
  it('keeps only the last path segment, whichever separator the client used', () => {
    expect(cleanFileName('../../etc/passwd.jpg', 'jpg')).toBe('passwd.jpg');
    expect(cleanFileName('..\\..\\windows\\system32\\scope.pdf', 'pdf')).toBe('scope.pdf');
    expect(cleanFileName('/', 'png')).toBe('attachment.png');
  });

  it('never yields a name made only of dots', () => {
    expect(cleanFileName('..', 'png')).toBe('attachment.png');
    expect(cleanFileName('...', 'jpg')).toBe('attachment.jpg');
    // leading dots go (no hidden files on download); what remains is the name
    expect(cleanFileName('.hidden.png', 'png')).toBe('hidden.png');
  });

  it('removes a right-to-left override that would disguise the extension', () => {
    // U+202E RIGHT-TO-LEFT OVERRIDE (Unicode UAX #9) makes "photo\u202Egpj.exe" display as "photoexe.jpg"
    expect(cleanFileName('photo\u202egpj.exe', 'jpg')).toBe('photogpj.exe.jpg');
  });

  it('removes control characters and header-breaking characters', () => {
    expect(cleanFileName('rail"\r\nX-Injected: 1.png', 'png')).toBe('rail_X-Injected_ 1.png');
    expect(cleanFileName('a<b>c|d?e*f.gif', 'gif')).toBe('a_b_c_d_e_f.gif');
  });

  it('gives the name the extension of what the bytes are', () => {
    expect(cleanFileName('photo.jpg', 'png')).toBe('photo.png');
    expect(cleanFileName('PHOTO.JPEG', 'jpg')).toBe('PHOTO.jpg');
    expect(cleanFileName('readings.csv', 'pdf')).toBe('readings.csv.pdf');
  });

  it('keeps non-Latin names, normalised to NFC', () => {
    // "e" + U+0301 COMBINING ACUTE ACCENT composes to U+00E9 under NFC (Unicode UAX #15)
    expect(cleanFileName('carte me\u0301re.jpg', 'jpg')).toBe('carte m\u00e9re.jpg');
    expect(cleanFileName('基板の写真.png', 'png')).toBe('基板の写真.png');
  });

  it('shortens long names to 120 characters without splitting a character', () => {
    const name = cleanFileName(`${'😀'.repeat(200)}.png`, 'png');
    expect([...name].length).toBe(120);
    expect(name.endsWith('😀.png')).toBe(true);
  });
});

describe('contentDisposition', () => {
  // checked with the `content-disposition` package's parser (jshttp, RFC 6266 / RFC 8187), which Express uses
  it('sends a plain ASCII name as a quoted filename only', () => {
    const header = contentDisposition('inline', 'vsys-short.jpg');
    expect(header).toBe('inline; filename="vsys-short.jpg"');
    expect(parse(header)).toEqual({ type: 'inline', parameters: { filename: 'vsys-short.jpg' } });
  });

  it('adds filename* with the exact UTF-8 name when it is not ASCII', () => {
    const header = contentDisposition('attachment', "carte m\u00e9re (rev 2)'s.pdf");
    const parsed = parse(header);
    expect(parsed.type).toBe('attachment');
    // a parser prefers filename* over filename (RFC 6266 §4.3)
    expect(parsed.parameters.filename).toBe("carte m\u00e9re (rev 2)'s.pdf");
    expect(header).toContain('filename="carte m_re (rev 2)\'s.pdf"');
  });

  it('cannot be broken out of by a quote or backslash from another caller', () => {
    const header = contentDisposition('inline', 'a"; filename="evil.html\\');
    expect(header).toContain('filename="a_; filename=_evil.html_"');
    const parsed = parse(header);
    // no extra parameter appeared, and the name came through literally: the quotes stayed inside values
    expect(parsed.type).toBe('inline');
    expect(Object.keys(parsed.parameters).sort()).toEqual(['filename', 'filename*']);
    expect(parsed.parameters.filename).toBe('a"; filename="evil.html\\');
  });
});
