// Joins what the readers produced — a netlist, optionally a parts list and annotations — into one
// board draft: components with kinds and parsed values, nets with kinds, ground, the root and the
// power links. Bad data never throws; it is reported as errors (the draft must not be written) or
// warnings, each naming its file and, where known, its line or field.
//
// What wins where two inputs say something about the same thing:
// - component kind: annotation, then the netlist, then the refdes prefix;
// - value and package: annotation, then a non-empty parts-list cell (the parts list says what is
//   fitted), then the netlist;
// - net kind: an annotation's kind wins; otherwise ground for ground nets, 'power' for nets with a
//   nominal voltage, nets of an entered power link, the root, and names that read as rails
//   (isPowerRailName: VBAT, VSYS, VCC…, VDD…, 3V3, USB_VBUS …); 'power' then spreads along
//   derived series links (a ferrite-fed N0012 behind VCC_3V3 is a rail too); everything else is
//   'signal'.
// - Derived series links are kept only between two power nets: a 0R in a signal line (UART_TX to
//   UART_TX_R) is not part of the power tree.
import type { AnnotationFile, ComponentKind, ImportIssue, NetKind } from '@railyard/shared';
import type {
  BoardDraft,
  DraftComponent,
  DraftNet,
  DraftPowerLink,
  NetlistRead,
  PartRow,
  PartsRead,
  RawComponent,
} from './board-draft';
import { deriveSeriesLinks } from './derive-power-links';
import { findGroundNets } from './ground-nets';
import { isPowerRailName, normalizeNetName } from './net-name';
import { inferComponentKind } from './refdes-kind';
import { detectRootNet } from './root-net';
import { kindHint, parseComponentValue, type ValueUnit } from './value-code';

export interface AssembleBoardInput {
  netlist: NetlistRead;
  parts?: PartsRead;
  annotations?: AnnotationFile | null;
  fileNames?: { netlist?: string; parts?: string; annotations?: string };
}

/** Units a value of these kinds may read as; anything else is worth a warning. */
const expectedUnits: Partial<Record<ComponentKind, ValueUnit[]>> = {
  resistor: ['ohm'],
  capacitor: ['F'],
  inductor: ['H'],
  ferrite: ['ohm', 'H'],
};

const unitNames: Record<ValueUnit, string> = {
  ohm: 'resistance',
  F: 'capacitance',
  H: 'inductance',
  V: 'voltage',
  A: 'current',
  Hz: 'frequency',
};

/** How many refdes a summary warning lists before it says "and n more". */
const listedInSummary = 10;

interface Source {
  file: string | undefined;
  line: number | null;
  field: string | null;
}

class IssueLog {
  readonly errors: ImportIssue[] = [];
  readonly warnings: ImportIssue[] = [];

  error(source: Source, message: string): void {
    this.errors.push(toIssue(source, message));
  }

  warn(source: Source, message: string): void {
    this.warnings.push(toIssue(source, message));
  }

  /** Issues a reader already found, with the file name filled in where the reader left it out. */
  adopt(read: { errors: ImportIssue[]; warnings: ImportIssue[] }, file: string | undefined): void {
    const withFile = (issue: ImportIssue): ImportIssue =>
      issue.file !== undefined || file === undefined ? issue : { ...issue, file };
    this.errors.push(...read.errors.map(withFile));
    this.warnings.push(...read.warnings.map(withFile));
  }
}

function toIssue(source: Source, message: string): ImportIssue {
  return {
    ...(source.file !== undefined ? { file: source.file } : {}),
    line: source.line,
    field: source.field,
    message,
  };
}

interface NetState {
  net: DraftNet;
  /** kind an annotation gave, which wins over every rule */
  annotatedKind: NetKind | undefined;
  /** where each alias came from, to point at it if it clashes */
  aliasSources: Map<string, Source>;
  annotatedAt: number | undefined;
}

/** Finds a refdes exactly, else ignoring case (parts lists are often typed in lower case). */
class RefdesIndex {
  private readonly exact = new Map<string, DraftComponent>();
  private readonly folded = new Map<string, DraftComponent>();

  add(component: DraftComponent): void {
    this.exact.set(component.refdes, component);
    const key = component.refdes.toUpperCase();
    if (!this.folded.has(key)) this.folded.set(key, component);
  }

  has(refdes: string): boolean {
    return this.exact.has(refdes);
  }

  find(refdes: string): DraftComponent | undefined {
    return this.exact.get(refdes) ?? this.folded.get(refdes.trim().toUpperCase());
  }
}

export function assembleBoard(input: AssembleBoardInput): BoardDraft {
  const files = input.fileNames ?? {};
  const annotations = input.annotations ?? null;
  const log = new IssueLog();
  log.adopt(input.netlist, files.netlist);
  if (input.parts) log.adopt(input.parts, files.parts);

  const at = {
    netlist: (line: number | null | undefined, field: string | null): Source => ({
      file: files.netlist,
      line: line ?? null,
      field,
    }),
    parts: (line: number | null | undefined, field: string | null): Source => ({
      file: files.parts,
      line: line ?? null,
      field,
    }),
    annotations: (field: string | null): Source => ({ file: files.annotations, line: null, field }),
  };

  // Components: the netlist decides which exist.
  const components: DraftComponent[] = [];
  const index = new RefdesIndex();
  const rawOf = new Map<DraftComponent, RawComponent>();
  for (const raw of input.netlist.components) {
    if (index.has(raw.refdes)) {
      log.error(at.netlist(raw.line, 'refdes'), `${raw.refdes} appears twice in the netlist`);
      continue;
    }
    const component = draftComponent(raw);
    components.push(component);
    index.add(component);
    rawOf.set(component, raw);
  }

  // Parts list rows fill values and packages.
  const partOf = new Map<DraftComponent, PartRow>();
  for (const row of input.parts?.parts ?? []) {
    const component = index.find(row.refdes);
    if (!component) {
      log.warn(
        at.parts(row.line, 'refdes'),
        `${row.refdes} is in the parts list but not in the netlist; the row is ignored`,
      );
      continue;
    }
    const first = partOf.get(component);
    if (first) {
      log.warn(
        at.parts(row.line, 'refdes'),
        `${row.refdes} appears again in the parts list (first on line ${first.line}); the first row is used`,
      );
      continue;
    }
    partOf.set(component, row);
  }
  if (input.parts) {
    const missing = components.filter((component) => !partOf.has(component));
    if (missing.length > 0) {
      const listed = missing.slice(0, listedInSummary).map((component) => component.refdes);
      const more =
        missing.length > listedInSummary ? ` and ${missing.length - listedInSummary} more` : '';
      log.warn(
        at.parts(null, null),
        `${missing.length} component(s) have no row in the parts list and keep the netlist's value: ${listed.join(', ')}${more}`,
      );
    }
  }

  // Annotations override kind, value and package.
  type ComponentAnnotation = AnnotationFile['components'][number];
  const annotationOf = new Map<DraftComponent, { entry: ComponentAnnotation; at: number }>();
  (annotations?.components ?? []).forEach((entry, i) => {
    const component = index.find(entry.refdes);
    if (!component) {
      log.warn(
        at.annotations(`components[${i}].refdes`),
        `${entry.refdes} is annotated but not in the netlist; the annotation is ignored`,
      );
      return;
    }
    annotationOf.set(component, { entry, at: i });
  });

  for (const component of components) {
    const raw = rawOf.get(component);
    const part = partOf.get(component);
    const annotation = annotationOf.get(component);
    component.kind = annotation?.entry.kind ?? raw?.kind ?? inferComponentKind(component.refdes);

    let valueSource: Source = at.netlist(raw?.line, 'value');
    if (annotation?.entry.value !== undefined) {
      component.value = annotation.entry.value.trim();
      valueSource = at.annotations(`components[${annotation.at}].value`);
    } else if (part && part.value.trim() !== '') {
      component.value = part.value.trim();
      valueSource = at.parts(part.line, 'value');
    }
    if (annotation?.entry.package !== undefined)
      component.package = annotation.entry.package.trim();
    else if (part && part.package.trim() !== '') component.package = part.package.trim();

    const parsed = parseComponentValue(component.value, component.kind);
    component.magnitude = parsed.magnitude;
    component.unit = parsed.unit;
    component.tolerance = parsed.tolerance;
    component.ratedVoltage = parsed.ratedVoltage;
    const expected = expectedUnits[component.kind];
    if (expected && parsed.unit !== null && !expected.includes(parsed.unit)) {
      const suits = kindHint(parsed);
      log.warn(
        valueSource,
        `${component.refdes} is a ${component.kind} but its value "${component.value}" reads as a ${unitNames[parsed.unit]}` +
          (suits ? `, which suits a ${suits}` : ''),
      );
    }
  }

  // Nets, in the order their first pin appears.
  const netStates = new Map<string, NetState>();
  for (const component of components) {
    for (const pin of component.pins) {
      if (pin.net === null || netStates.has(pin.net)) continue;
      netStates.set(pin.net, {
        net: {
          name: pin.net,
          normalizedName: normalizeNetName(pin.net),
          kind: 'signal',
          nominalVoltage: null,
          description: '',
          aliases: [],
        },
        annotatedKind: undefined,
        aliasSources: new Map(),
        annotatedAt: undefined,
      });
    }
  }

  for (const [name, aliases] of Object.entries(input.netlist.netAliases)) {
    const state = netStates.get(name);
    if (!state) {
      log.warn(at.netlist(null, 'aliases'), `the alias table names net ${name}, which no pin uses`);
      continue;
    }
    for (const alias of aliases) addAlias(state, alias, at.netlist(null, 'aliases'));
  }

  const aliasOwners = () => {
    const owners = new Map<string, string[]>();
    for (const state of netStates.values()) {
      for (const alias of state.aliasSources.keys()) {
        owners.set(alias, [...(owners.get(alias) ?? []), state.net.name]);
      }
    }
    return owners;
  };

  let owners = aliasOwners();
  const resolveNet = (name: string): NetState | undefined => {
    const exact = netStates.get(name);
    if (exact) return exact;
    const named = owners.get(name);
    return named?.length === 1 && named[0] !== undefined ? netStates.get(named[0]) : undefined;
  };
  const missingNetMessage = (what: string, name: string): string => {
    const key = normalizeNetName(name);
    const similar = [...netStates.values()].find((state) => state.net.normalizedName === key);
    return `${what} ${name} is not a net of this board${similar ? ` (did you mean ${similar.net.name}?)` : ''}`;
  };

  (annotations?.nets ?? []).forEach((entry, i) => {
    const state = resolveNet(entry.name);
    if (!state) {
      log.error(at.annotations(`nets[${i}].name`), missingNetMessage('annotated net', entry.name));
      return;
    }
    if (state.annotatedAt !== undefined) {
      log.warn(
        at.annotations(`nets[${i}].name`),
        `net ${state.net.name} is annotated again (also nets[${state.annotatedAt}]); the later entry wins`,
      );
    }
    state.annotatedAt = i;
    if (entry.kind !== undefined) state.annotatedKind = entry.kind;
    if (entry.nominalVoltage !== undefined) state.net.nominalVoltage = entry.nominalVoltage;
    if (entry.description !== undefined) state.net.description = entry.description;
    (entry.aliases ?? []).forEach((alias, j) =>
      addAlias(state, alias, at.annotations(`nets[${i}].aliases[${j}]`)),
    );
  });

  // An alias must find one net: never another net's name, and preferably one owner.
  owners = aliasOwners();
  for (const state of netStates.values()) {
    for (const [alias, source] of state.aliasSources) {
      if (netStates.has(alias)) {
        log.error(source, `alias ${alias} of net ${state.net.name} is the name of another net`);
        state.aliasSources.delete(alias);
      }
    }
  }
  owners = aliasOwners();
  for (const [alias, names] of owners) {
    if (names.length < 2) continue;
    const source = netStates.get(names[names.length - 1] ?? '')?.aliasSources.get(alias);
    log.warn(
      source ?? at.annotations(null),
      `alias ${alias} is given to several nets (${names.join(', ')}); it will not find a single net`,
    );
  }
  for (const state of netStates.values()) state.net.aliases = [...state.aliasSources.keys()];
  const nets = [...netStates.values()].map((state) => state.net);

  // Ground: by name and by connections, then as annotated.
  const groundList = findGroundNets(
    components.map((component) => ({
      refdes: component.refdes,
      kind: component.kind,
      pins: component.pins.map((pin) => ({ pin: pin.pin, net: pin.net })),
    })),
  );
  const ground = new Set(groundList);
  for (const state of netStates.values()) {
    if (state.annotatedKind === 'ground') ground.add(state.net.name);
    else if (state.annotatedKind !== undefined) ground.delete(state.net.name);
  }

  // Root: as annotated, else detected.
  let rootNet: string | null = null;
  if (annotations?.rootNet !== undefined) {
    const state = resolveNet(annotations.rootNet);
    if (!state) {
      log.error(at.annotations('rootNet'), missingNetMessage('root net', annotations.rootNet));
    } else if (ground.has(state.net.name)) {
      log.error(at.annotations('rootNet'), `root net ${state.net.name} is a ground net`);
    } else {
      rootNet = state.net.name;
    }
  } else {
    rootNet = detectRootNet(components, nets, ground);
  }

  // Entered power links.
  const entered: DraftPowerLink[] = [];
  const seen = new Map<string, number>();
  (annotations?.powerLinks ?? []).forEach((link, i) => {
    const from = resolveNet(link.from);
    const to = resolveNet(link.to);
    const via = index.find(link.via);
    if (!from)
      log.error(at.annotations(`powerLinks[${i}].from`), missingNetMessage('net', link.from));
    if (!to) log.error(at.annotations(`powerLinks[${i}].to`), missingNetMessage('net', link.to));
    if (!via) {
      log.error(at.annotations(`powerLinks[${i}].via`), `part ${link.via} is not on this board`);
    }
    if (!from || !to || !via) return;
    if (from === to) {
      log.error(
        at.annotations(`powerLinks[${i}].to`),
        `the link through ${via.refdes} starts and ends on net ${from.net.name}`,
      );
      return;
    }
    const touched = new Set(via.pins.map((pin) => pin.net));
    if (!touched.has(from.net.name) && !touched.has(to.net.name)) {
      log.warn(
        at.annotations(`powerLinks[${i}].via`),
        `${via.refdes} has no pin on ${from.net.name} or ${to.net.name}; check the part named for this link`,
      );
    }
    for (const end of [from, to]) {
      if (ground.has(end.net.name)) {
        log.warn(
          at.annotations(`powerLinks[${i}]`),
          `the link through ${via.refdes} ends on ground net ${end.net.name}; ground is not part of the power tree`,
        );
      }
    }
    const key = [from.net.name, to.net.name, via.refdes, link.kind].join('\u0000');
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      log.warn(
        at.annotations(`powerLinks[${i}]`),
        `same link as powerLinks[${earlier}]; kept once`,
      );
      return;
    }
    seen.set(key, i);
    entered.push({
      from: from.net.name,
      to: to.net.name,
      via: via.refdes,
      kind: link.kind,
      origin: 'entered',
    });
  });

  const derived = deriveSeriesLinks(components, ground, { rootNet, knownLinks: entered });

  // Net kinds.
  const power = new Set<string>();
  const annotatedSignal = new Set<string>();
  for (const state of netStates.values()) {
    const { net } = state;
    if (state.annotatedKind === 'signal') annotatedSignal.add(net.name);
    if (ground.has(net.name) || state.annotatedKind === 'signal') continue;
    if (
      state.annotatedKind === 'power' ||
      net.nominalVoltage !== null ||
      net.name === rootNet ||
      [net.name, ...net.aliases].some(isPowerRailName)
    ) {
      power.add(net.name);
    }
  }
  for (const link of entered) {
    for (const name of [link.from, link.to]) {
      if (!ground.has(name) && !annotatedSignal.has(name)) power.add(name);
    }
  }
  spreadAlongSeriesLinks(power, derived, (name) => !ground.has(name) && !annotatedSignal.has(name));
  for (const state of netStates.values()) {
    const name = state.net.name;
    state.net.kind = ground.has(name) ? 'ground' : power.has(name) ? 'power' : 'signal';
  }
  const series = derived.filter((link) => power.has(link.from) && power.has(link.to));

  return {
    meta: { ...input.netlist.meta, ...(annotations?.board ?? {}) },
    nets,
    components,
    powerLinks: [...entered, ...series],
    rootNet,
    groundNets: [
      ...groundList.filter((name) => ground.has(name)),
      ...[...ground].filter((name) => !groundList.includes(name)),
    ],
    errors: log.errors,
    warnings: log.warnings,
  };
}

function draftComponent(raw: RawComponent): DraftComponent {
  return {
    refdes: raw.refdes,
    kind: raw.kind ?? 'other',
    value: (raw.value ?? '').trim(),
    magnitude: null,
    unit: null,
    tolerance: null,
    ratedVoltage: null,
    package: (raw.package ?? '').trim(),
    side: raw.side ?? null,
    x: raw.x ?? null,
    y: raw.y ?? null,
    rotation: raw.rotation ?? null,
    pins: raw.pins.map((pin) => {
      const net = pin.net?.trim() ?? '';
      return { pin: pin.pin, net: net === '' ? null : net, x: pin.x ?? null, y: pin.y ?? null };
    }),
  };
}

function addAlias(state: NetState, alias: string, source: Source): void {
  const name = alias.trim();
  if (name === '' || name === state.net.name || state.aliasSources.has(name)) return;
  state.aliasSources.set(name, source);
}

/** Marks as power every net a derived series link joins to a power net, however many links away. */
function spreadAlongSeriesLinks(
  power: Set<string>,
  links: DraftPowerLink[],
  mayBePower: (name: string) => boolean,
): void {
  const neighbours = new Map<string, string[]>();
  const connect = (from: string, to: string) => {
    const list = neighbours.get(from);
    if (list) list.push(to);
    else neighbours.set(from, [to]);
  };
  for (const link of links) {
    connect(link.from, link.to);
    connect(link.to, link.from);
  }
  const queue = [...power];
  for (let head = 0; head < queue.length; head++) {
    for (const next of neighbours.get(queue[head] as string) ?? []) {
      if (power.has(next) || !mayBePower(next)) continue;
      power.add(next);
      queue.push(next);
    }
  }
}
