// Land patterns of the invented demo boards: body size and pad centres relative to the part's centre,
// in millimetres, before rotation. Only as exact as a technician reading the board would notice.

export interface Pad {
  pin: string;
  dx: number;
  dy: number;
}

export interface Footprint {
  package: string;
  /** body along x before rotation */
  length: number;
  /** body along y before rotation */
  width: number;
  pads: Pad[];
}

/** Chip sizes by imperial code (FACTS §4, thick-film chip resistor datasheets). */
const chipBodies = {
  '01005': [0.4, 0.2],
  '0201': [0.6, 0.3],
  '0402': [1.0, 0.5],
  '0603': [1.6, 0.8],
  '0805': [2.0, 1.25],
  '1206': [3.2, 1.6],
  '1210': [3.2, 2.5],
  '2512': [6.35, 3.2],
} as const;
export type ChipCode = keyof typeof chipBodies;

/** Two-terminal chip part (resistor, capacitor, ferrite, fuse, chip inductor). */
export function chip(code: ChipCode): Footprint {
  const [length, width] = chipBodies[code];
  // Terminations sit at the body ends; their centres are roughly 40 % of the length from the middle.
  const half = round(length * 0.4);
  return { package: code, length, width, pads: [pad('1', -half, 0), pad('2', half, 0)] };
}

/** Moulded power inductor, named by its metric footprint (e.g. IND-2016 = 2.0 × 1.6 mm). */
export function powerInductor(length: number, width: number): Footprint {
  const code = `${Math.round(length * 10)}${Math.round(width * 10)}`.padStart(4, '0');
  const half = round(length * 0.36);
  return { package: `IND-${code}`, length, width, pads: [pad('1', -half, 0), pad('2', half, 0)] };
}

/** Rows of JEDEC ball-grid names skip letters that read like digits or each other. */
const bgaRowLetters = 'ABCDEFGHJKLMNPRTUVWY';

export function bgaRowName(row: number): string {
  const letters = bgaRowLetters.length;
  if (row < letters) return bgaRowLetters[row] as string;
  return `${bgaRowLetters[Math.floor(row / letters) - 1] as string}${bgaRowLetters[row % letters] as string}`;
}

/**
 * Ball or land grid (BGA, WLCSP, LGA). `omit` depopulates positions, as real packages do in the
 * corners and the centre. Pads are listed row by row, so callers assign nets in that order.
 */
export function gridArray(
  packageName: string,
  rows: number,
  cols: number,
  pitch: number,
  omit: (row: number, col: number) => boolean = () => false,
): Footprint {
  const pads: Pad[] = [];
  const x0 = (-(cols - 1) * pitch) / 2;
  const y0 = ((rows - 1) * pitch) / 2;
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      if (omit(r, c)) continue;
      pads.push(pad(`${bgaRowName(r)}${c + 1}`, x0 + c * pitch, y0 - r * pitch));
    }
  }
  return { package: packageName, length: cols * pitch + pitch, width: rows * pitch + pitch, pads };
}

/** Quad flat no-lead or quad flat pack: pins counter-clockwise from pin 1 at the top of the left side. */
export function quadFlat(
  packageName: string,
  pinsPerSide: number,
  pitch: number,
  body: number,
  exposedPad: boolean,
): Footprint {
  const pads: Pad[] = [];
  const span = ((pinsPerSide - 1) * pitch) / 2;
  const edge = body / 2 - 0.25;
  let n = 1;
  for (let i = 0; i < pinsPerSide; i++) pads.push(pad(String(n++), -edge, span - i * pitch));
  for (let i = 0; i < pinsPerSide; i++) pads.push(pad(String(n++), -span + i * pitch, -edge));
  for (let i = 0; i < pinsPerSide; i++) pads.push(pad(String(n++), edge, -span + i * pitch));
  for (let i = 0; i < pinsPerSide; i++) pads.push(pad(String(n++), span - i * pitch, edge));
  if (exposedPad) pads.push(pad(String(n), 0, 0));
  return { package: packageName, length: body, width: body, pads };
}

/** Two rows of pins (SOT, SOIC, DFN): pin 1 top-left, down the left row, back up the right row. */
export function dualRow(
  packageName: string,
  pinsPerRow: number,
  pitch: number,
  rowSpan: number,
  length: number,
  width: number,
): Footprint {
  const pads: Pad[] = [];
  const span = ((pinsPerRow - 1) * pitch) / 2;
  let n = 1;
  for (let i = 0; i < pinsPerRow; i++) pads.push(pad(String(n++), -rowSpan / 2, span - i * pitch));
  for (let i = 0; i < pinsPerRow; i++) pads.push(pad(String(n++), rowSpan / 2, -span + i * pitch));
  return { package: packageName, length, width, pads };
}

/** Three-lead transistor package: gate and source on one side, drain alone on the other. */
export function sot3(packageName: string, length: number, width: number): Footprint {
  const pitch = round(length * 0.33);
  const row = round(width * 0.4);
  return {
    package: packageName,
    length,
    width,
    pads: [pad('1', -pitch, -row), pad('2', pitch, -row), pad('3', 0, row)],
  };
}

/** Board-to-board or flex connector: odd pins on one row, even on the other, as connector drawings number them. */
export function connectorRows(
  packageName: string,
  pinsPerRow: number,
  pitch: number,
  rowSpan: number,
): Footprint {
  const pads: Pad[] = [];
  const span = ((pinsPerRow - 1) * pitch) / 2;
  for (let i = 0; i < pinsPerRow; i++) {
    pads.push(pad(String(2 * i + 1), -span + i * pitch, rowSpan / 2));
    pads.push(pad(String(2 * i + 2), -span + i * pitch, -rowSpan / 2));
  }
  return { package: packageName, length: span * 2 + pitch * 3, width: rowSpan + 1.2, pads };
}

/** A single round pad: test point or plated mounting hole. */
export function singlePad(packageName: string, diameter: number): Footprint {
  return { package: packageName, length: diameter, width: diameter, pads: [pad('1', 0, 0)] };
}

/** Any footprint given pin by pin. */
export function customFootprint(
  packageName: string,
  length: number,
  width: number,
  pads: Pad[],
): Footprint {
  return { package: packageName, length, width, pads };
}

export function pad(pin: string, dx: number, dy: number): Pad {
  return { pin, dx: round(dx), dy: round(dy) };
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
