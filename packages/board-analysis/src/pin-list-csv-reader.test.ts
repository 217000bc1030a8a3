import { describe, expect, it } from 'vitest';
import { readPinListCsv } from './pin-list-csv-reader';

const csv = (...lines: string[]) => `${lines.join('\n')}\n`;

describe('readPinListCsv', () => {
  it('reads pins with positions in millimetres and the side of each part', () => {
    const read = readPinListCsv(
      csv(
        'refdes,pin,net,x,y,side',
        'U1,1,VBAT,10.0,20.5,top',
        'U1,2,VSYS,12,20.5,top',
        'C3,1,GND,-1.5e1,0.25,bottom',
      ),
    );
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([]);
    expect(read.components).toEqual([
      {
        refdes: 'U1',
        side: 'top',
        line: 2,
        x: 11,
        y: 20.5,
        pins: [
          { pin: '1', net: 'VBAT', x: 10, y: 20.5, line: 2 },
          { pin: '2', net: 'VSYS', x: 12, y: 20.5, line: 3 },
        ],
      },
      {
        refdes: 'C3',
        side: 'bottom',
        line: 4,
        x: -15,
        y: 0.25,
        pins: [{ pin: '1', net: 'GND', x: -15, y: 0.25, line: 4 }],
      },
    ]);
  });

  it('accepts header names in any case and any order', () => {
    const read = readPinListCsv(csv('Net,PIN,RefDes', 'VCC_3V3,3,R2'));
    expect(read.errors).toEqual([]);
    expect(read.components[0]).toMatchObject({
      refdes: 'R2',
      pins: [{ pin: '3', net: 'VCC_3V3' }],
    });
  });

  it('reads an empty net and N/C as not connected', () => {
    const read = readPinListCsv(csv('refdes,pin,net', 'U1,1,', 'U1,2,N/C', 'U1,3,n/c'));
    expect(read.components[0]?.pins.map((p) => p.net)).toEqual([null, null, null]);
  });

  it('warns about unknown columns and ignores them', () => {
    const read = readPinListCsv(csv('refdes,pin,net,layer', 'U1,1,GND,L1'));
    expect(read.errors).toEqual([]);
    expect(read.warnings).toEqual([expect.objectContaining({ line: 1, field: 'layer' })]);
  });

  it('refuses a header without the required columns', () => {
    const read = readPinListCsv(csv('refdes,net', 'U1,GND'));
    expect(read.errors).toEqual([expect.objectContaining({ line: 1, field: 'pin' })]);
    expect(read.components).toEqual([]);
  });

  it('hints at semicolons when the header is one semicolon-separated cell', () => {
    const read = readPinListCsv(csv('refdes;pin;net', 'U1;1;GND'));
    expect(read.errors[0]?.message).toMatch(/not semicolons/);
  });

  it('collects every bad field with its line instead of stopping at the first', () => {
    const read = readPinListCsv(
      csv(
        'refdes,pin,net,x,y,side',
        ',1,GND,1,1,top',
        'U1,1,GND,1.2.3,1,top',
        'U1,2,GND,1,1,left',
        'U1,3,GND,1,,top',
      ),
    );
    expect(read.errors.map((e) => [e.line, e.field])).toEqual([
      [2, 'refdes'],
      [3, 'x'],
      [4, 'side'],
      [5, 'y'],
    ]);
    expect(read.errors[1]?.message).toBe(
      "x '1.2.3' is not a number (millimetres, with a point as decimal separator)",
    );
  });

  it('names both lines when a pin appears on two nets', () => {
    const read = readPinListCsv(csv('refdes,pin,net', 'U1,1,VBAT', 'U1,2,GND', 'U1,1,VSYS'));
    expect(read.errors).toEqual([
      {
        line: 4,
        field: 'net',
        message: 'U1-1 is on net VBAT at line 2 and on net VSYS at line 4',
      },
    ]);
  });

  it('warns about a pin repeated with the same net and keeps one', () => {
    const read = readPinListCsv(csv('refdes,pin,net', 'U1,1,VBAT', 'U1,1,VBAT'));
    expect(read.errors).toEqual([]);
    expect(read.components[0]?.pins).toHaveLength(1);
    expect(read.warnings).toEqual([expect.objectContaining({ line: 3, field: 'pin' })]);
  });

  it('refuses a part placed on both sides', () => {
    const read = readPinListCsv(csv('refdes,pin,net,side', 'U1,1,VBAT,top', 'U1,2,GND,bottom'));
    expect(read.errors).toEqual([expect.objectContaining({ line: 3, field: 'side' })]);
  });

  it('reads a file with a byte-order mark and CRLF line endings', () => {
    const read = readPinListCsv('\uFEFFrefdes,pin,net\r\nU1,1,VBAT\r\nU1,2,GND\r\n');
    expect(read.errors).toEqual([]);
    expect(read.components[0]?.pins.map((p) => [p.pin, p.net, p.line])).toEqual([
      ['1', 'VBAT', 2],
      ['2', 'GND', 3],
    ]);
  });

  it('reads quoted fields with commas and doubled quotes and keeps line numbers after them', () => {
    // RFC 4180 §2: fields with commas, quotes or line breaks are quoted; a quote inside is doubled.
    const read = readPinListCsv(
      csv(
        'refdes,pin,net',
        'U1,1,"VBAT,SENSE"',
        'U1,2,"say ""hi"""',
        'U1,3,"two',
        'lines"',
        'U1,4,GND',
      ),
    );
    expect(read.errors).toEqual([]);
    expect(read.components[0]?.pins.map((p) => [p.net, p.line])).toEqual([
      ['VBAT,SENSE', 2],
      ['say "hi"', 3],
      ['two\nlines', 4],
      ['GND', 6],
    ]);
  });

  it('counts blank lines when numbering rows', () => {
    const read = readPinListCsv(csv('', 'refdes,pin,net', '', 'U1,1,VBAT', '   ', ',,', 'U1,2,'));
    expect(read.errors).toEqual([]);
    expect(read.components[0]?.pins.map((p) => p.line)).toEqual([4, 7]);
  });

  it('reports a CSV syntax error with its line', () => {
    const read = readPinListCsv(csv('refdes,pin,net', 'U1,1,GND', 'U1,2,"VBAT'));
    expect(read.errors).toEqual([
      expect.objectContaining({
        line: 3,
        field: null,
        message: expect.stringMatching(/^CSV syntax/),
      }),
    ]);
  });

  it('refuses a row with more fields than the header', () => {
    const read = readPinListCsv(csv('refdes,pin,net', 'U1,1,VBAT,SENSE', 'U1,2,GND,,'));
    expect(read.errors).toEqual([expect.objectContaining({ line: 2, field: null })]);
    expect(read.components[0]?.pins.map((p) => p.pin)).toEqual(['2']);
  });

  it('refuses an empty file and a file with only a header', () => {
    expect(readPinListCsv('').errors).toHaveLength(1);
    expect(readPinListCsv('refdes,pin,net\n').errors).toEqual([
      expect.objectContaining({ message: 'the file has a header row but no pins' }),
    ]);
  });
});
