import { describe, expect, it } from 'vitest';
import { readPartsCsv } from './parts-csv-reader';

const csv = (...lines: string[]) => `${lines.join('\n')}\n`;

describe('readPartsCsv', () => {
  it('reads value and package for each refdes, with the line of each row', () => {
    const read = readPartsCsv(
      csv('refdes,value,package', 'R1,4K7,0402', 'C1,"4u7, 10V",0603', 'U1,,QFN-16'),
    );
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([]);
    expect(read.parts).toEqual([
      { refdes: 'R1', value: '4K7', package: '0402', line: 2 },
      { refdes: 'C1', value: '4u7, 10V', package: '0603', line: 3 },
      { refdes: 'U1', value: '', package: 'QFN-16', line: 4 },
    ]);
  });

  it('accepts a file without a package column and in any column order or case', () => {
    const read = readPartsCsv(csv('Value,RefDes', '10K,R2'));
    expect(read.errors).toEqual([]);
    expect(read.parts).toEqual([{ refdes: 'R2', value: '10K', package: '', line: 2 }]);
  });

  it('warns about extra columns and ignores them', () => {
    const read = readPartsCsv(csv('refdes,value,package,supplier', 'R1,1K,0402,ACME'));
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([expect.objectContaining({ line: 1, field: 'supplier' })]);
    expect(read.parts[0]).not.toHaveProperty('supplier');
  });

  it('refuses a header without a value column', () => {
    const read = readPartsCsv(csv('refdes,package', 'R1,0402'));
    expect(read.errors).toEqual([expect.objectContaining({ line: 1, field: 'value' })]);
    expect(read.parts).toEqual([]);
  });

  it('names both lines of a refdes listed twice', () => {
    const read = readPartsCsv(csv('refdes,value', 'R1,1K', 'R2,2K2', 'R1,10K'));
    expect(read.errors).toEqual([
      { line: 4, field: 'refdes', message: 'R1 is listed twice, at line 2 and line 4' },
    ]);
  });

  it('reports every row without a refdes', () => {
    const read = readPartsCsv(csv('refdes,value', ',1K', 'R2,2K2', ',10K'));
    expect(read.errors.map((e) => [e.line, e.field])).toEqual([
      [2, 'refdes'],
      [4, 'refdes'],
    ]);
  });

  it('warns about a row that gives neither value nor package', () => {
    const read = readPartsCsv(csv('refdes,value,package', 'TP1,,'));
    expect(read.warnings).toEqual([expect.objectContaining({ line: 2, field: 'value' })]);
  });

  it('reads a byte-order mark and CRLF line endings', () => {
    const read = readPartsCsv('\uFEFFrefdes,value\r\nR1,1K\r\nR2,2K2\r\n');
    expect(read.parts.map((p) => [p.refdes, p.line])).toEqual([
      ['R1', 2],
      ['R2', 3],
    ]);
  });

  it('reports a CSV syntax error with its line', () => {
    const read = readPartsCsv(csv('refdes,value', 'R1,"1K'));
    expect(read.errors).toEqual([
      expect.objectContaining({ line: 2, message: expect.stringMatching(/^CSV syntax/) }),
    ]);
  });
});
