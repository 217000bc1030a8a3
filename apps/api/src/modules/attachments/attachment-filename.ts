// Uploaded file names are shown and offered back as download names, never used to store anything. They
// are cleaned so that a name cannot carry a path, a control character, a right-to-left override that
// disguises the extension, or a quote that breaks out of a header.

// C0 and C1 controls and DEL
const controls = /[\u0000-\u001f\u007f-\u009f]/g;
// bidirectional embeddings, overrides and isolates (Unicode UAX #9), zero-width and BOM characters
const invisibles = /[\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g;
// reserved on common file systems, or special in a quoted header value (RFC 9110 §5.6.4)
const reserved = /["\\/:*?<>|]/g;

const maxLength = 120;
const fallbackStem = 'attachment';

/** Extensions of the allowed kinds, so "photo.jpg" that holds a PNG becomes "photo.png", not "photo.jpg.png". */
const knownExtensions = new Set([
  'jpg',
  'jpeg',
  'jpe',
  'jfif',
  'png',
  'apng',
  'webp',
  'gif',
  'pdf',
]);

/**
 * A display and download name for an upload: the last path segment only, NFC-normalised, without
 * controls, invisible characters or reserved characters, at most 120 characters, ending in the
 * extension of the type the bytes turned out to be.
 */
export function cleanFileName(uploaded: string, extension: string): string {
  const lastSegment = uploaded.split(/[/\\]/).pop() ?? '';
  let name = lastSegment
    .normalize('NFC')
    .replace(controls, '')
    .replace(invisibles, '')
    .replace(reserved, '_');
  name = name
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.\s]+|[.\s]+$/g, '');
  const dot = name.lastIndexOf('.');
  let stem =
    dot > 0 && knownExtensions.has(name.slice(dot + 1).toLowerCase()) ? name.slice(0, dot) : name;
  stem = stem.replace(/[.\s]+$/g, '');
  if (stem === '') stem = fallbackStem;
  const suffix = `.${extension}`;
  // cut by code points so a surrogate pair is never split
  const stemChars = [...stem];
  if (stemChars.length + suffix.length > maxLength)
    stem = stemChars
      .slice(0, maxLength - suffix.length)
      .join('')
      .trimEnd();
  return `${stem}${suffix}`;
}

/** RFC 8187 ext-value: UTF-8, percent-encoding everything outside attr-char. */
function extValue(value: string): string {
  return `UTF-8''${encodeURIComponent(value).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`;
}

/**
 * Content-Disposition for a cleaned name (RFC 6266): an ASCII `filename` every client reads, plus
 * `filename*` with the exact UTF-8 name when it is not plain ASCII (RFC 6266 §4.3).
 */
export function contentDisposition(disposition: 'inline' | 'attachment', name: string): string {
  // cleanFileName already removed quotes, backslashes and controls; stay safe for any other caller
  const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  const header = `${disposition}; filename="${ascii}"`;
  return ascii === name ? header : `${header}; filename*=${extValue(name)}`;
}
