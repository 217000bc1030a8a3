// Reads a pin-list CSV (one row per pin: refdes, pin, net, optional x/y in mm and side) — the
// lowest common denominator most CAD tools can export. Also holds the header-checked CSV table
// reading that the parts-list reader shares.
import { parse } from 'csv-parse/sync';
import type { BoardSide, ImportIssue } from '@railyard/shared';
import type { NetlistRead, RawComponent, RawPin } from './board-draft';

export interface CsvTableColumns {
  required: readonly string[];
  optional: readonly string[];
}

export interface CsvTableRow {
  /** 1-based line where the row starts */
  line: number;
  /** trimmed cells as written; look them up through CsvTable.columns */
  values: string[];
}

export interface CsvTable {
  /** lower-case name of each known column present → its index in a row's values */
  columns: ReadonlyMap<string, number>;
  rows: CsvTableRow[];
  warnings: ImportIssue[];
  errors: ImportIssue[];
}

/** The trimmed cell of a column, '' when the column is absent or the row is short. */
export function csvCell(table: CsvTable, row: CsvTableRow, column: string): string {
  const index = table.columns.get(column);
  return index === undefined ? '' : (row.values[index] ?? '');
}

/** Line breaks inside quoted cells (RFC 4180 allows them): each moves the next row down a line. */
function lineBreaksIn(record: string[]): number {
  let count = 0;
  for (const cell of record) {
    if (cell.indexOf('\n') < 0 && cell.indexOf('\r') < 0) continue;
    count += cell.match(/\r\n|\r|\n/g)?.length ?? 0;
  }
  return count;
}

function csvIssue(error: unknown): ImportIssue {
  const lines = (error as { lines?: unknown }).lines;
  return {
    line: typeof lines === 'number' ? lines : null,
    field: null,
    message: `CSV syntax: ${error instanceof Error ? error.message : String(error)}`,
  };
}

const isBlank = (record: string[]) => record.every((cell) => cell === '');

/**
 * Parses CSV text whose first row names the columns (any order, any case). Missing required
 * columns are errors and leave no rows; unknown columns are warnings and are dropped. After a
 * CSV syntax error only the syntax errors are reported: rows after a broken quote are unreliable.
 */
export function readCsvTable(text: string, columns: CsvTableColumns): CsvTable {
  const warnings: ImportIssue[] = [];
  const errors: ImportIssue[] = [];
  const none = (): CsvTable => ({ columns: new Map(), rows: [], warnings, errors });
  let records: string[][];
  try {
    // Blank lines are kept as records so rows can be numbered by counting; csv-parse's own
    // line info would do it too but doubles the parse time on a large pin list.
    records = parse(text, {
      bom: true,
      trim: true,
      skip_empty_lines: false,
      // Rows of the wrong length are reported below with their line, not thrown by the parser.
      relax_column_count: true,
      // Keeps going after a bad quote so every syntax problem is reported, not just the first.
      skip_records_with_error: true,
      on_skip: (error) => {
        if (error) errors.push(csvIssue(error));
        return undefined;
      },
    });
  } catch (error) {
    errors.push(csvIssue(error));
    return none();
  }
  if (errors.length > 0) return none();

  // Only a quoted cell can hold a line break (RFC 4180), so unquoted files skip the count.
  const quoted = text.includes('"');
  let line = 1;
  let headerIndex = -1;
  const starts: number[] = new Array<number>(records.length);
  for (let i = 0; i < records.length; i++) {
    const record = records[i] ?? [];
    starts[i] = line;
    line += quoted ? 1 + lineBreaksIn(record) : 1;
    if (headerIndex < 0 && !isBlank(record)) headerIndex = i;
  }
  const header = records[headerIndex];
  if (!header) {
    errors.push({
      line: null,
      field: null,
      message: `the file is empty; expected a header row naming the columns ${columns.required.join(', ')}`,
    });
    return none();
  }
  const headerLine = starts[headerIndex] ?? 1;
  const names = header.map((cell) => cell.toLowerCase());
  const known = new Set([...columns.required, ...columns.optional]);
  const seen = new Map<string, number>();
  names.forEach((name, index) => {
    if (name === '') return;
    if (seen.has(name)) {
      errors.push({
        line: headerLine,
        field: name,
        message: `column '${name}' appears twice in the header (columns ${(seen.get(name) ?? 0) + 1} and ${index + 1})`,
      });
    } else seen.set(name, index);
    if (!known.has(name)) {
      warnings.push({
        line: headerLine,
        field: header[index] ?? name,
        message: `unknown column '${header[index]}' is ignored`,
      });
    }
  });
  const missing = columns.required.filter((name) => !seen.has(name));
  if (missing.length > 0) {
    const semicolons = header.length === 1 && (header[0] ?? '').includes(';');
    errors.push({
      line: headerLine,
      field: missing[0] ?? null,
      message:
        `the header row lacks the column(s) ${missing.join(', ')}; it must name ${columns.required.join(', ')}` +
        (semicolons ? ' separated by commas, not semicolons' : ''),
    });
  }
  if (errors.length > 0) return none();

  const used = new Map([...seen].filter(([name]) => known.has(name)));
  const rows: CsvTableRow[] = [];
  for (let i = headerIndex + 1; i < records.length; i++) {
    const record = records[i] ?? [];
    const rowLine = starts[i] ?? 0;
    if (isBlank(record)) continue;
    if (record.length > names.length && record.slice(names.length).some((cell) => cell !== '')) {
      errors.push({
        line: rowLine,
        field: null,
        message: `row has ${record.length} fields but the header names ${names.length}; quote values that contain commas`,
      });
      continue;
    }
    rows.push({ line: rowLine, values: record });
  }
  return { columns: used, rows, warnings, errors };
}

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function readMillimetres(
  text: string,
  row: CsvTableRow,
  field: 'x' | 'y',
  errors: ImportIssue[],
): number | undefined | null {
  if (text === '') return undefined;
  if (!DECIMAL.test(text)) {
    errors.push({
      line: row.line,
      field,
      message: `${field} '${text}' is not a number (millimetres, with a point as decimal separator)`,
    });
    return null;
  }
  return Number(text);
}

export function readPinListCsv(text: string): NetlistRead {
  const table = readCsvTable(text, {
    required: ['refdes', 'pin', 'net'],
    optional: ['x', 'y', 'side'],
  });
  const { warnings, errors } = table;
  const components = new Map<
    string,
    { component: RawComponent; sideLine: number; pins: Map<string, RawPin> }
  >();

  for (const row of table.rows) {
    const refdes = csvCell(table, row, 'refdes');
    const pinName = csvCell(table, row, 'pin');
    const netText = csvCell(table, row, 'net');
    const sideCell = csvCell(table, row, 'side');
    const sideText = sideCell.toLowerCase();
    const before = errors.length;
    if (refdes === '') errors.push({ line: row.line, field: 'refdes', message: 'refdes is empty' });
    if (pinName === '') errors.push({ line: row.line, field: 'pin', message: 'pin is empty' });
    const x = readMillimetres(csvCell(table, row, 'x'), row, 'x', errors);
    const y = readMillimetres(csvCell(table, row, 'y'), row, 'y', errors);
    if ((x === undefined) !== (y === undefined)) {
      const missing = x === undefined ? 'x' : 'y';
      errors.push({
        line: row.line,
        field: missing,
        message: `${missing} is empty while ${missing === 'x' ? 'y' : 'x'} is given; give both or neither`,
      });
    }
    let side: BoardSide | undefined;
    if (sideText === 'top' || sideText === 'bottom') side = sideText;
    else if (sideText !== '') {
      errors.push({
        line: row.line,
        field: 'side',
        message: `side '${sideCell}' is not top or bottom`,
      });
    }
    if (errors.length > before) continue;

    const net = netText === '' || netText.toUpperCase() === 'N/C' ? null : netText;
    let slot = components.get(refdes);
    if (!slot) {
      slot = {
        component: { refdes, pins: [], line: row.line },
        sideLine: row.line,
        pins: new Map(),
      };
      components.set(refdes, slot);
    }
    const seen = slot.pins.get(pinName);
    if (seen) {
      if (seen.net !== net) {
        errors.push({
          line: row.line,
          field: 'net',
          message: `${refdes}-${pinName} is on net ${seen.net ?? 'N/C'} at line ${seen.line} and on net ${net ?? 'N/C'} at line ${row.line}`,
        });
      } else {
        warnings.push({
          line: row.line,
          field: 'pin',
          message: `${refdes}-${pinName} repeats line ${seen.line}; the repeat is ignored`,
        });
      }
      continue;
    }

    if (side) {
      const current = slot.component.side;
      if (current === undefined) {
        slot.component.side = side;
        slot.sideLine = row.line;
      } else if (current !== side) {
        errors.push({
          line: row.line,
          field: 'side',
          message: `${refdes} is on the ${current} side at line ${slot.sideLine} but on the ${side} side at line ${row.line}`,
        });
      }
    }
    const pin: RawPin = { pin: pinName, net, line: row.line };
    if (typeof x === 'number' && typeof y === 'number') {
      pin.x = x;
      pin.y = y;
    }
    slot.component.pins.push(pin);
    slot.pins.set(pinName, pin);
  }

  const list = [...components.values()].map(({ component }) => {
    const placed = component.pins.filter((p) => p.x !== undefined && p.y !== undefined);
    if (placed.length > 0) {
      component.x = placed.reduce((sum, p) => sum + (p.x ?? 0), 0) / placed.length;
      component.y = placed.reduce((sum, p) => sum + (p.y ?? 0), 0) / placed.length;
    }
    return component;
  });
  if (table.errors.length === 0 && table.rows.length === 0) {
    errors.push({ line: null, field: null, message: 'the file has a header row but no pins' });
  }
  return { meta: {}, components: list, netAliases: {}, warnings, errors };
}
