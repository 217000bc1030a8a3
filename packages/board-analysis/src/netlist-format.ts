// Guesses which reader a netlist upload needs when the user does not say. Content decides first,
// because file extensions of exported netlists are inconsistent; the extension breaks ties.
import type { NetlistFormat } from '@railyard/shared';

const EXTENSIONS: Record<string, NetlistFormat> = {
  ipc: 'ipc-d-356',
  '356': 'ipc-d-356',
  d356: 'ipc-d-356',
  net: 'ipc-d-356',
  csv: 'csv',
  json: 'json',
};

/** How many leading non-blank lines are enough to recognise a format. */
const SNIFF_LINES = 40;

// IPC-D-356A: C comment, P parameter, 3xx test/feature record, 0xx continuation, 999 end.
const IPC_LINE = /^(?:C|P(?:\s|$)|[03]\d\d|999)/;
const IPC_RECORD = /^(?:3\d7|P\s+(?:JOB|UNITS|CODE|VER|IMAGE|NNAME\d+)\b)/;

function leadingLines(text: string): string[] {
  const lines: string[] = [];
  let start = 0;
  while (lines.length < SNIFF_LINES && start < text.length) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    const line = text.slice(start, end).replace(/\r$/, '');
    if (line.trim() !== '') lines.push(line);
    start = end + 1;
  }
  return lines;
}

function looksLikeBoardJson(text: string): boolean {
  if (!text.trimStart().startsWith('{')) return false;
  // The format key sits near the top in files we write; a full parse settles the rest.
  if (/"format"\s*:\s*"railyard-board"/.test(text.slice(0, 4096))) return true;
  try {
    const value: unknown = JSON.parse(text);
    return (value as { format?: unknown } | null)?.format === 'railyard-board';
  } catch {
    return false;
  }
}

function looksLikePinList(firstLine: string): boolean {
  const names = firstLine.split(',').map((cell) => cell.trim().replace(/^"|"$/g, '').toLowerCase());
  return ['refdes', 'pin', 'net'].every((name) => names.includes(name));
}

function looksLikeIpcD356(lines: string[]): boolean {
  return (
    lines.length > 0 &&
    lines.every((l) => IPC_LINE.test(l)) &&
    lines.some((l) => IPC_RECORD.test(l))
  );
}

export function detectNetlistFormat(fileName: string, text: string): NetlistFormat | null {
  const body = text.replace(/^\uFEFF/, '');
  if (looksLikeBoardJson(body)) return 'json';
  const lines = leadingLines(body);
  if (lines[0] !== undefined && looksLikePinList(lines[0])) return 'csv';
  if (looksLikeIpcD356(lines)) return 'ipc-d-356';
  const extension = /\.([^./\\]+)$/.exec(fileName.toLowerCase())?.[1];
  return (extension && EXTENSIONS[extension]) || null;
}
