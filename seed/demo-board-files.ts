// Turns the generated demo boards into the files Railyard imports: an IPC-D-356A netlist with a
// parts list and annotations, a `railyard-board` JSON file, and a pin-list CSV. Both the writing
// script and the drift test call this, so the committed files are exactly what it returns.
import type { AnnotationFile } from '@railyard/shared';
import { writeIpcD356 } from '../packages/board-analysis/src/ipc-d-356-writer';
import type { DemoComponent } from './board-builder';
import { generatePhoneBoard } from './phone-board';
import { generateTabletBoard } from './tablet-board';

export interface DemoFile {
  /** relative to the folder the boards are written into */
  path: string;
  content: string;
}

export interface NetlistBoard {
  job: string;
  title: string;
  revision: string;
  components: DemoComponent[];
  annotations: AnnotationFile;
}

/** netlist.ipc (inch units), parts.csv and annotations.json of one board, under `folder`. */
export function netlistBoardFiles(folder: string, board: NetlistBoard): DemoFile[] {
  const netlist = writeIpcD356(
    { job: board.job, title: board.title, revision: board.revision, components: board.components },
    { units: 'inch' },
  );
  return [
    { path: `${folder}/netlist.ipc`, content: netlist },
    { path: `${folder}/parts.csv`, content: partsCsv(board.components) },
    { path: `${folder}/annotations.json`, content: jsonText(board.annotations) },
  ];
}

/** Every committed demo file, in a fixed order. */
export function demoBoardFiles(): DemoFile[] {
  const phone = generatePhoneBoard();
  const tablet = generateTabletBoard();
  return [
    ...netlistBoardFiles(phone.slug, phone),
    { path: `${tablet.slug}/board.json`, content: jsonText(tablet.file) },
    { path: `${tablet.slug}/pins.csv`, content: pinsCsv(tablet.components) },
  ];
}

export function partsCsv(components: readonly DemoComponent[]): string {
  return csv(
    ['refdes', 'value', 'package'],
    components.map((c) => [c.refdes, c.value, c.package]),
  );
}

/** One row per pin, the columns the pin-list reader takes (x and y in mm; empty net = not connected). */
export function pinsCsv(components: readonly DemoComponent[]): string {
  return csv(
    ['refdes', 'pin', 'net', 'x', 'y', 'side'],
    components.flatMap((c) =>
      c.pins.map((p) => [
        c.refdes,
        p.pin,
        p.net ?? '',
        p.x === undefined ? '' : String(p.x),
        p.y === undefined ? '' : String(p.y),
        c.side ?? '',
      ]),
    ),
  );
}

/**
 * JSON laid out the way the repository's formatter (Prettier, print width 100) leaves it, so
 * formatting the repository never changes a committed demo file: objects of plain values and arrays
 * of plain values stay on one line when they fit; anything else gets one entry per line.
 */
export function jsonText(value: unknown): string {
  return `${jsonValue(value, '', '')}\n`;
}

const printWidth = 100;

function jsonValue(value: unknown, indent: string, lead: string): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  const inner = `${indent}  `;
  // Prettier always breaks an array of two or more objects that each have several keys.
  const alwaysBreaks =
    Array.isArray(value) &&
    value.length > 1 &&
    value.every((v) => isObject(v) && Object.keys(v).length > 1);
  const flat = alwaysBreaks ? null : flatJson(value);
  if (flat !== null && fits(lead, flat)) return flat;
  if (Array.isArray(value)) {
    return `[\n${value.map((v) => inner + jsonValue(v, inner, inner)).join(',\n')}\n${indent}]`;
  }
  const entries = Object.entries(value).filter(([, v]) => v !== undefined);
  return `{\n${entries
    .map(([k, v]) => {
      const key = `${inner}${JSON.stringify(k)}: `;
      return key + jsonValue(v, inner, key);
    })
    .join(',\n')}\n${indent}}`;
}

/** One-line form of arrays of plain values and of objects whose values are plain; null otherwise. */
function flatJson(value: unknown): string | null {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) {
    const items = value.map(flatJson);
    return items.every((item) => item !== null) ? `[${items.join(', ')}]` : null;
  }
  const entries = Object.entries(value).filter(([, v]) => v !== undefined);
  if (entries.length === 0) return '{}';
  if (!entries.every(([, v]) => v === null || typeof v !== 'object')) return null;
  return `{ ${entries.map(([k, v]) => `${JSON.stringify(k)}: ${JSON.stringify(v)}`).join(', ')} }`;
}

function isObject(value: unknown): value is object {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** Whether `text` fits after `lead` on one line, counting the comma that may follow it. */
function fits(lead: string, text: string): boolean {
  return lead.length + text.length + 1 <= printWidth;
}

function csv(header: readonly string[], rows: readonly (readonly string[])[]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\n') + '\n';
}

/** RFC 4180: quote a cell holding a comma, quote or line break, doubling inner quotes. */
function csvCell(cell: string): string {
  return /[",\r\n]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell;
}
