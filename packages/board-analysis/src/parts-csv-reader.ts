// Reads a parts list CSV (refdes, value, optional package): what a bare netlist does not say
// about each part. Values stay as written; value-code parsing happens when the board is assembled.
import type { ImportIssue } from '@railyard/shared';
import type { PartRow, PartsRead } from './board-draft';
import { csvCell, readCsvTable } from './pin-list-csv-reader';

export function readPartsCsv(text: string): PartsRead {
  const table = readCsvTable(text, { required: ['refdes', 'value'], optional: ['package'] });
  const warnings: ImportIssue[] = [...table.warnings];
  const errors: ImportIssue[] = [...table.errors];
  const parts: PartRow[] = [];
  const firstLine = new Map<string, number>();

  for (const row of table.rows) {
    const refdes = csvCell(table, row, 'refdes');
    const value = csvCell(table, row, 'value');
    const packageName = csvCell(table, row, 'package');
    if (refdes === '') {
      errors.push({ line: row.line, field: 'refdes', message: 'refdes is empty' });
      continue;
    }
    const earlier = firstLine.get(refdes);
    if (earlier !== undefined) {
      errors.push({
        line: row.line,
        field: 'refdes',
        message: `${refdes} is listed twice, at line ${earlier} and line ${row.line}`,
      });
      continue;
    }
    firstLine.set(refdes, row.line);
    if (value === '' && packageName === '') {
      warnings.push({
        line: row.line,
        field: 'value',
        message: `${refdes} has neither a value nor a package; the row adds nothing`,
      });
    }
    parts.push({ refdes, value, package: packageName, line: row.line });
  }
  if (table.errors.length === 0 && table.rows.length === 0) {
    errors.push({ line: null, field: null, message: 'the file has a header row but no parts' });
  }
  return { parts, warnings, errors };
}
