import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { detectNetlistFormat } from './netlist-format';

// The conformant IPC-D-356A sample of FACTS.md §11.
const ipcSample = readFileSync(new URL('./fixtures/demo-board-a.ipc', import.meta.url), 'utf8');
const boardJson = JSON.stringify({ format: 'railyard-board', version: 1, components: [] }, null, 2);

describe('detectNetlistFormat', () => {
  it('recognises an IPC-D-356 file by its records whatever it is called', () => {
    expect(detectNetlistFormat('demo-board-a.ipc', ipcSample)).toBe('ipc-d-356');
    expect(detectNetlistFormat('netlist.txt', ipcSample)).toBe('ipc-d-356');
    expect(detectNetlistFormat('netlist', ipcSample.replace(/\n/g, '\r\n'))).toBe('ipc-d-356');
  });

  it('recognises an IPC-D-356 file that starts straight with test records', () => {
    const records = ipcSample
      .split('\n')
      .filter((l) => l.startsWith('3') || l === '999')
      .join('\n');
    expect(detectNetlistFormat('x', records)).toBe('ipc-d-356');
  });

  it('recognises a pin-list CSV by its header, in any order and case', () => {
    expect(detectNetlistFormat('pins.txt', 'Net,RefDes,Pin,X,Y\nGND,U1,1,0,0\n')).toBe('csv');
    expect(detectNetlistFormat('pins', '\uFEFF"refdes","pin","net"\r\nU1,1,GND\r\n')).toBe('csv');
  });

  it('recognises a railyard-board JSON file by its format key', () => {
    expect(detectNetlistFormat('board.txt', boardJson)).toBe('json');
    const late = JSON.stringify({
      components: [{ refdes: 'R1', value: 'x'.repeat(5000) }],
      format: 'railyard-board',
    });
    expect(detectNetlistFormat('board', late)).toBe('json');
  });

  it('falls back to the extension when the content does not decide', () => {
    expect(detectNetlistFormat('parts.CSV', 'refdes,value\nR1,1K\n')).toBe('csv');
    expect(detectNetlistFormat('notes.json', '{"format":"railyard-annotations"}')).toBe('json');
    expect(detectNetlistFormat('board.d356', 'garbage')).toBe('ipc-d-356');
    expect(detectNetlistFormat('board.356', '')).toBe('ipc-d-356');
  });

  it('gives null when neither content nor extension says what the file is', () => {
    expect(detectNetlistFormat('readme.txt', 'Hello, this is not a netlist.\n')).toBeNull();
    expect(detectNetlistFormat('noext', 'C  a comment only\nC  another\n')).toBeNull();
  });
});
