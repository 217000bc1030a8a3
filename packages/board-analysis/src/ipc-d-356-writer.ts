// Writes a board's netlist as an IPC-D-356A file, for handing to test-fixture and CAM tools.
// Layout per the IPC-D-356A record layout: parameter keyword in columns 4–9, value from column 10;
// NNAME alias number in 9–13, long name from 15; test-record fields as read by ipc-d-356-reader.
import type { RawComponent } from './board-draft';

export interface IpcD356Board {
  job: string;
  title?: string;
  revision?: string;
  components: RawComponent[];
}

export interface IpcD356WriteOptions {
  /** inch writes UNITS CUST 0 (0.0001 in), mm writes UNITS CUST 1 (0.001 mm). Default inch. */
  units?: 'inch' | 'mm';
}

const LINE_WIDTH = 80;
const NET_WIDTH = 14;
const REFDES_WIDTH = 6;
const PIN_WIDTH = 4;
const MAX_COORDINATE = 999_999;
const MAX_SIZE = 9_999;

// Raw pins carry no hole or pad sizes, so the writer states nominal ones: a 1.016 mm (0.040 in)
// plated hole with a 1.6 mm round pad, and a 0.5 mm square surface pad. They are exactly
// representable in both unit systems and only matter to fixture builders, not to the netlist.
const NOMINAL_DRILL_MM = 1.016;
const NOMINAL_THROUGH_PAD_MM = 1.6;
const NOMINAL_SURFACE_PAD_MM = 0.5;

/** Thrown when the board cannot be expressed in the fixed IPC-D-356 columns. */
export class IpcD356WriteError extends Error {
  override name = 'IpcD356WriteError';
}

function toUnits(mm: number, units: 'inch' | 'mm'): number {
  return Math.round(units === 'inch' ? (mm * 100_000) / 254 : mm * 1000);
}

function signed(value: number, what: string): string {
  if (Math.abs(value) > MAX_COORDINATE) {
    throw new IpcD356WriteError(`${what} does not fit the six digits of an IPC-D-356 coordinate`);
  }
  return (value < 0 ? '-' : '+') + String(Math.abs(value)).padStart(6, '0');
}

function size(value: number): string {
  return String(Math.min(Math.max(value, 0), MAX_SIZE)).padStart(4, '0');
}

function parameter(keyword: string, value: string): string {
  return `P  ${keyword.padEnd(6)}${value}`.slice(0, LINE_WIDTH).trimEnd();
}

/** Net names that must travel as NNAME aliases: too long, or that would read back as an alias token. */
function needsAlias(net: string): boolean {
  return net.length > NET_WIDTH || /^NNAME\d+$/i.test(net) || net.toUpperCase() === 'N/C';
}

export function writeIpcD356(board: IpcD356Board, options: IpcD356WriteOptions = {}): string {
  const units = options.units ?? 'inch';
  const lines: string[] = [
    'C  IPC-D-356A netlist written by Railyard',
    parameter('JOB', board.job),
    parameter('CODE', '00'),
    parameter('UNITS', units === 'inch' ? 'CUST 0' : 'CUST 1'),
  ];
  if (board.title) lines.push(parameter('TITLE', board.title));
  if (board.revision) lines.push(parameter('REV', board.revision));
  lines.push(parameter('VER', 'IPC-D-356A'), parameter('IMAGE', 'PRIMARY'));

  const aliases = new Map<string, string>();
  for (const component of board.components) {
    for (const pin of component.pins) {
      if (pin.net === null || !needsAlias(pin.net) || aliases.has(pin.net)) continue;
      const number = aliases.size + 1;
      const token = `NNAME${number}`;
      const line = `P  NNAME${String(number).padEnd(5)} ${pin.net}`;
      if (line.length > LINE_WIDTH) {
        throw new IpcD356WriteError(
          `net name '${pin.net}' is longer than the ${LINE_WIDTH - 14} characters an NNAME record holds`,
        );
      }
      aliases.set(pin.net, token);
      lines.push(line);
    }
  }

  const drill = size(toUnits(NOMINAL_DRILL_MM, units));
  const throughPad = size(toUnits(NOMINAL_THROUGH_PAD_MM, units));
  const surfacePad = size(toUnits(NOMINAL_SURFACE_PAD_MM, units));
  for (const component of board.components) {
    const refdes = component.refdes;
    if (refdes.length > REFDES_WIDTH) {
      throw new IpcD356WriteError(
        `refdes '${refdes}' is longer than the ${REFDES_WIDTH} characters of IPC-D-356 columns 21–26`,
      );
    }
    if (refdes.toUpperCase() === 'VIA') {
      throw new IpcD356WriteError("refdes 'VIA' is reserved for vias in IPC-D-356");
    }
    for (const pin of component.pins) {
      const name = `${refdes}-${pin.pin}`;
      if (pin.pin.length > PIN_WIDTH) {
        throw new IpcD356WriteError(
          `pin '${name}' is longer than the ${PIN_WIDTH} characters of IPC-D-356 columns 28–31`,
        );
      }
      const x = pin.x ?? component.x;
      const y = pin.y ?? component.y;
      if (x === undefined || y === undefined) {
        throw new IpcD356WriteError(`${name} has no position; IPC-D-356 test records need X and Y`);
      }
      const net = pin.net === null ? 'N/C' : (aliases.get(pin.net) ?? pin.net);
      // IPC-D-356A: 327 surface pad with access A01 top / A02 bottom (2-layer numbering);
      // 317 plated through-hole, drilled, accessible from both sides (A00).
      const surface = component.side !== undefined;
      const hole = surface ? '      ' : `D${drill}P`;
      const access = surface ? (component.side === 'top' ? 'A01' : 'A02') : 'A00';
      const pad = surface ? `X${surfacePad}Y${surfacePad}` : `X${throughPad}Y0000`;
      lines.push(
        (surface ? '327' : '317') +
          net.padEnd(NET_WIDTH) +
          '   ' +
          refdes.padEnd(REFDES_WIDTH) +
          '-' +
          pin.pin.padEnd(PIN_WIDTH) +
          ' ' +
          hole +
          access +
          `X${signed(toUnits(x, units), `${name} X`)}` +
          `Y${signed(toUnits(y, units), `${name} Y`)}` +
          pad +
          'R000' +
          ' S0',
      );
    }
  }
  lines.push('999');
  return `${lines.join('\n')}\n`;
}
