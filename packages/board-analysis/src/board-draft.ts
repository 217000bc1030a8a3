// The in-memory shapes every reader produces and the importer writes. No I/O here.
import type {
  BoardMeta,
  BoardSide,
  ComponentKind,
  ImportIssue,
  NetKind,
  PowerLinkKind,
  PowerLinkOrigin,
} from '@railyard/shared';

/** A pin as a netlist file gives it. Coordinates in millimetres. */
export interface RawPin {
  pin: string;
  /** null = not connected */
  net: string | null;
  x?: number;
  y?: number;
  /** the line in the source file, for error messages */
  line?: number;
}

/** A component as a netlist file gives it: most fields are optional until parts and annotations fill them. */
export interface RawComponent {
  refdes: string;
  kind?: ComponentKind;
  value?: string;
  package?: string;
  side?: BoardSide;
  x?: number;
  y?: number;
  rotation?: number;
  pins: RawPin[];
  line?: number;
}

/** What a netlist reader returns. `errors` non-empty means the file must not be imported. */
export interface NetlistRead {
  meta: Partial<BoardMeta>;
  components: RawComponent[];
  /** Long net names, alias tables and similar extras, name → aliases. */
  netAliases: Record<string, string[]>;
  warnings: ImportIssue[];
  errors: ImportIssue[];
}

export interface DraftPin {
  pin: string;
  net: string | null;
  x: number | null;
  y: number | null;
}

export interface DraftComponent {
  refdes: string;
  kind: ComponentKind;
  value: string;
  magnitude: number | null;
  unit: string | null;
  tolerance: number | null;
  ratedVoltage: number | null;
  package: string;
  side: BoardSide | null;
  x: number | null;
  y: number | null;
  rotation: number | null;
  pins: DraftPin[];
}

export interface DraftNet {
  name: string;
  normalizedName: string;
  kind: NetKind;
  nominalVoltage: number | null;
  description: string;
  aliases: string[];
}

export interface DraftPowerLink {
  from: string;
  to: string;
  /** refdes of the component the power passes through */
  via: string;
  kind: PowerLinkKind;
  origin: PowerLinkOrigin;
}

/** A complete board ready to be written in one transaction. */
export interface BoardDraft {
  meta: Partial<BoardMeta>;
  nets: DraftNet[];
  components: DraftComponent[];
  powerLinks: DraftPowerLink[];
  rootNet: string | null;
  groundNets: string[];
  warnings: ImportIssue[];
  errors: ImportIssue[];
}

/** One row of a parts list: what a bare netlist lacks. */
export interface PartRow {
  refdes: string;
  value: string;
  package: string;
  line: number;
}

export interface PartsRead {
  parts: PartRow[];
  warnings: ImportIssue[];
  errors: ImportIssue[];
}
