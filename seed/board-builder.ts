// Places invented parts on an invented board outline and wires their pins to nets.
// Parts never overlap on the same side: a coarse occupancy grid is kept per side, and a part that
// cannot find room near where it belongs spirals outward, the way a layout engineer would push it.
import type {
  AnnotationFile,
  BoardMeta,
  BoardSide,
  ComponentKind,
  NetAnnotation,
  PowerLinkInput,
  PowerLinkKind,
} from '@railyard/shared';
import type { RawComponent } from '../packages/board-analysis/src/board-draft';
import { inferComponentKind } from '../packages/board-analysis/src/refdes-kind';
import { singlePad, type Footprint } from './footprints';
import type { Random } from './random';

export type Mount = BoardSide | 'through';
export type Rotation = 0 | 90 | 180 | 270;

export interface Point {
  x: number;
  y: number;
}

export interface Placement {
  side: Mount;
  at: Point;
  /** How far from `at` the first tries land, in mm. 0 = exactly at `at` if free (connectors, big chips). */
  spread?: number;
  /** 'any' lets small parts turn to fit. */
  rotation?: Rotation | 'any';
}

export interface PartInput {
  prefix: string;
  kind: ComponentKind;
  value: string;
  footprint: Footprint;
  /** One entry per footprint pad, in pad order; null = not connected. */
  nets: readonly (string | null)[];
  place: Placement;
  /** Clearance kept around the body, mm. */
  clearance?: number;
}

/** A component as the generator keeps it: always placed, always with value and package. */
export interface DemoComponent extends RawComponent {
  kind: ComponentKind;
  value: string;
  package: string;
  x: number;
  y: number;
  rotation: number;
}

/** A generated board as the demo files are written from it. */
export interface DemoNetlistBoard {
  slug: string;
  job: string;
  title: string;
  revision: string;
  components: DemoComponent[];
  annotations: AnnotationFile;
}

const cellSize = 0.2;
const testPointPad = singlePad('TP-0.8', 0.8);
const edgeKeepout = 0.8;
const maxTries = 4000;

export class BoardBuilder {
  readonly components: DemoComponent[] = [];
  private placedPins = 0;
  private readonly counters = new Map<string, number>();
  private readonly columns: number;
  private readonly rowsCount: number;
  private readonly occupied: Record<BoardSide, Uint8Array>;
  private refdesBlock: number | null = null;
  private readonly netHomes = new Map<string, Point>();
  private readonly netNotes: NetAnnotation[] = [];
  private readonly links: PowerLinkInput[] = [];

  constructor(
    readonly width: number,
    readonly height: number,
    private readonly random: Random,
    readonly groundNet = 'GND',
  ) {
    this.columns = Math.ceil(width / cellSize);
    this.rowsCount = Math.ceil(height / cellSize);
    this.occupied = {
      top: new Uint8Array(this.columns * this.rowsCount),
      bottom: new Uint8Array(this.columns * this.rowsCount),
    };
  }

  /** Pins placed so far, kept as a running total because generators ask after every part. */
  get pinTotal(): number {
    return this.placedPins;
  }

  /**
   * Number the following parts in a block (block 3 → C3001, C3002 …), as phone boards group
   * reference designators by circuit area. null = plain sequential numbering.
   */
  block(block: number | null): void {
    this.refdesBlock = block;
  }

  nextRefdes(prefix: string): string {
    const key = `${prefix}@${this.refdesBlock ?? ''}`;
    const count = (this.counters.get(key) ?? 0) + 1;
    this.counters.set(key, count);
    const refdes = `${prefix}${this.refdesBlock === null ? count : this.refdesBlock * 1000 + count}`;
    // IPC-D-356 gives the reference designator six columns (21–26).
    if (refdes.length > 6)
      throw new RangeError(`reference designator ${refdes} is longer than 6 characters`);
    return refdes;
  }

  add(part: PartInput): DemoComponent {
    const { footprint, nets, place } = part;
    if (nets.length !== footprint.pads.length) {
      throw new RangeError(
        `${part.prefix} ${part.value} (${footprint.package}): ${nets.length} nets given for ${footprint.pads.length} pads`,
      );
    }
    const refdes = this.nextRefdes(part.prefix);
    const rotation: Rotation =
      place.rotation === 'any'
        ? this.random.pick([0, 90, 180, 270] as const)
        : (place.rotation ?? 0);
    const turned = rotation === 90 || rotation === 270;
    const w = (turned ? footprint.width : footprint.length) + 2 * (part.clearance ?? 0.1);
    const h = (turned ? footprint.length : footprint.width) + 2 * (part.clearance ?? 0.1);
    const centre = this.findRoom(refdes, w, h, place);

    const sides: BoardSide[] = place.side === 'through' ? ['top', 'bottom'] : [place.side];
    for (const side of sides) this.mark(side, centre, w, h);

    const radians = (rotation * Math.PI) / 180;
    const cos = Math.round(Math.cos(radians));
    const sin = Math.round(Math.sin(radians));
    // Seen from the top, bottom-side parts are mirrored left to right.
    const mirror = place.side === 'bottom' ? -1 : 1;
    const component: DemoComponent = {
      refdes,
      kind: part.kind,
      value: part.value,
      package: footprint.package,
      x: round(centre.x),
      y: round(centre.y),
      rotation,
      pins: footprint.pads.map((p, i) => {
        const dx = p.dx * mirror;
        return {
          pin: p.pin,
          net: nets[i] ?? null,
          x: round(centre.x + dx * cos - p.dy * sin),
          y: round(centre.y + dx * sin + p.dy * cos),
        };
      }),
    };
    if (place.side !== 'through') component.side = place.side;
    for (const p of component.pins)
      if (p.net !== null && !this.netHomes.has(p.net)) this.netHomes.set(p.net, centre);
    this.components.push(component);
    this.placedPins += component.pins.length;
    return component;
  }

  /** A two-terminal part between two nets. */
  twoPin(
    prefix: string,
    kind: ComponentKind,
    value: string,
    footprint: Footprint,
    from: string | null,
    to: string | null,
    place: Placement,
  ): DemoComponent {
    return this.add({
      prefix,
      kind,
      value,
      footprint,
      nets: [from, to],
      place: { rotation: 'any', ...place },
    });
  }

  /** Decoupling capacitors from a rail to ground, spread around where the load draws current. */
  decouple(
    rail: string,
    place: Placement,
    caps: readonly (readonly [count: number, value: string, footprint: Footprint])[],
  ): void {
    for (const [count, value, footprint] of caps) {
      for (let i = 0; i < count; i++) {
        this.twoPin('C', 'capacitor', value, footprint, rail, this.groundNet, {
          ...place,
          spread: place.spread || 1.5,
        });
      }
    }
  }

  /** Where the first part on a net was placed: test points and late additions go near it. */
  homeOf(net: string): Point {
    const home = this.netHomes.get(net);
    if (!home) throw new RangeError(`net ${net} has no parts yet`);
    return home;
  }

  /** A test point on a net, near its first part. */
  testPoint(net: string, side: BoardSide, spread = 3): DemoComponent {
    return this.add({
      prefix: 'TP',
      kind: 'testpoint',
      value: 'TP',
      footprint: testPointPad,
      nets: [net],
      place: { side, at: this.homeOf(net), spread },
    });
  }

  /** Declares a power rail (or switch node) for the annotations. */
  rail(
    name: string,
    nominalVoltage: number | null,
    description?: string,
    aliases?: string[],
  ): string {
    if (this.netNotes.some((n) => n.name === name))
      throw new RangeError(`net ${name} annotated twice`);
    this.netNotes.push({
      name,
      kind: 'power',
      nominalVoltage,
      ...(description ? { description } : {}),
      ...(aliases ? { aliases } : {}),
    });
    return name;
  }

  /** Declares a ground net for the annotations. */
  groundRail(name: string, description?: string): string {
    this.netNotes.push({
      name,
      kind: 'ground',
      nominalVoltage: 0,
      ...(description ? { description } : {}),
    });
    return name;
  }

  /** A converter or switch the netlist cannot show; series parts are left for the importer to find. */
  link(from: string, to: string, via: DemoComponent, kind: Exclude<PowerLinkKind, 'series'>): void {
    this.links.push({ from, to, via: via.refdes, kind });
  }

  annotations(board: Partial<BoardMeta>, rootNet: string): AnnotationFile {
    const overrides = this.components
      // Only parts whose kind the importer would not read from the refdes prefix need an override.
      .filter((c) => inferComponentKind(c.refdes) !== c.kind)
      .map((c) => ({ refdes: c.refdes, kind: c.kind }));
    return {
      format: 'railyard-annotations',
      version: 1,
      board,
      rootNet,
      nets: this.netNotes.map((n) => ({ ...n })),
      components: overrides,
      powerLinks: this.links.map((l) => ({ ...l })),
    };
  }

  private findRoom(refdes: string, w: number, h: number, place: Placement): Point {
    const sides: BoardSide[] = place.side === 'through' ? ['top', 'bottom'] : [place.side];
    const fits = (p: Point) =>
      this.inside(p, w, h) && sides.every((side) => this.free(side, p, w, h));
    // A part asked for at an exact spot (a connector at the edge, a big chip) that finds it taken
    // moves as little as it can, rather than failing the whole board for one seed.
    if (!place.spread && fits(place.at)) return place.at;
    const spread = place.spread || 0.5;
    for (let attempt = 0; attempt < maxTries; attempt++) {
      const radius = spread * (1 + attempt / 25) * Math.sqrt(this.random.float());
      const angle = this.random.float() * 2 * Math.PI;
      const candidate = {
        x: snap(place.at.x + radius * Math.cos(angle)),
        y: snap(place.at.y + radius * Math.sin(angle)),
      };
      if (fits(candidate)) return candidate;
    }
    throw new RangeError(
      `no room for ${refdes} near (${place.at.x}, ${place.at.y}) on ${place.side}`,
    );
  }

  private inside(p: Point, w: number, h: number): boolean {
    return (
      p.x - w / 2 >= edgeKeepout &&
      p.y - h / 2 >= edgeKeepout &&
      p.x + w / 2 <= this.width - edgeKeepout &&
      p.y + h / 2 <= this.height - edgeKeepout
    );
  }

  private cells(p: Point, w: number, h: number): [number, number, number, number] {
    return [
      Math.max(0, Math.floor((p.x - w / 2) / cellSize)),
      Math.min(this.columns - 1, Math.ceil((p.x + w / 2) / cellSize) - 1),
      Math.max(0, Math.floor((p.y - h / 2) / cellSize)),
      Math.min(this.rowsCount - 1, Math.ceil((p.y + h / 2) / cellSize) - 1),
    ];
  }

  private free(side: BoardSide, p: Point, w: number, h: number): boolean {
    const grid = this.occupied[side];
    const [c0, c1, r0, r1] = this.cells(p, w, h);
    for (let r = r0; r <= r1; r++) {
      const row = r * this.columns;
      for (let c = c0; c <= c1; c++) if (grid[row + c] === 1) return false;
    }
    return true;
  }

  private mark(side: BoardSide, p: Point, w: number, h: number): void {
    const grid = this.occupied[side];
    const [c0, c1, r0, r1] = this.cells(p, w, h);
    for (let r = r0; r <= r1; r++) {
      const row = r * this.columns;
      for (let c = c0; c <= c1; c++) grid[row + c] = 1;
    }
  }
}

function snap(value: number): number {
  return Math.round(value * 20) / 20;
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
