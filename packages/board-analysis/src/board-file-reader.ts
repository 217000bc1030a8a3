// Reads Railyard's own JSON files: `railyard-board` v1 (a whole board) and `railyard-annotations`
// v1 (what a netlist lacks). Problems come back as ImportIssues with the line they sit on: JSON.parse
// does the parsing, and a small position-tracking scan maps error positions and zod paths to lines.
import {
  annotationFileSchema,
  boardFileSchema,
  type AnnotationFile,
  type BoardMeta,
  type ImportIssue,
} from '@railyard/shared';
import type { z } from 'zod';
import type { NetlistRead, RawComponent } from './board-draft';

type PathSegment = string | number;

interface PathNode {
  /** line where the value at this path starts, once scanned */
  line: number | null;
  children: Map<string, PathNode> | null;
  /** for arrays: the node every element without its own entry in `children` shares */
  each: PathNode | null;
  /** when set, the start line of every value reaching this node, in document order */
  seen: number[] | null;
}

const pathNode = (): PathNode => ({ line: null, children: null, each: null, seen: null });

class JsonSyntaxError extends Error {
  constructor(
    message: string,
    readonly line: number,
  ) {
    super(message);
  }
}

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const ESCAPES = new Set(['"', '\\', '/', 'b', 'f', 'n', 'r', 't']);
const HEX4 = /^[0-9a-fA-F]{4}$/;

/**
 * Walks JSON text (RFC 8259 grammar) keeping the line number, and notes the line where each
 * value in `wanted` starts. Throws JsonSyntaxError at the first grammar error.
 */
class JsonLineScanner {
  private i = 0;
  private line = 1;
  private lineStart = 0;

  constructor(private readonly text: string) {}

  scan(wanted: PathNode | undefined): void {
    this.value(wanted);
    this.whitespace();
    if (this.i < this.text.length) this.fail('unexpected text after the end of the JSON value');
  }

  private fail(message: string): never {
    throw new JsonSyntaxError(`${message} (column ${this.i - this.lineStart + 1})`, this.line);
  }

  private whitespace(): void {
    const text = this.text;
    for (;;) {
      const c = text.charCodeAt(this.i);
      if (c === 0x20 || c === 0x09 || c === 0x0d) this.i += 1;
      else if (c === 0x0a) {
        this.i += 1;
        this.line += 1;
        this.lineStart = this.i;
      } else return;
    }
  }

  private value(node: PathNode | undefined): void {
    this.whitespace();
    if (node) {
      node.line = this.line;
      node.seen?.push(this.line);
    }
    const c = this.text[this.i];
    if (c === '{') this.object(node);
    else if (c === '[') this.array(node);
    else if (c === '"') this.string(false);
    else if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) this.number();
    else if (c === 't') this.literal('true');
    else if (c === 'f') this.literal('false');
    else if (c === 'n') this.literal('null');
    else if (c === undefined) this.fail('unexpected end of file where a value should start');
    else this.fail(`unexpected character '${c}' where a value should start`);
  }

  private object(node: PathNode | undefined): void {
    this.i += 1;
    this.whitespace();
    if (this.text[this.i] === '}') {
      this.i += 1;
      return;
    }
    for (;;) {
      this.whitespace();
      if (this.text[this.i] !== '"') this.fail('expected a property name in double quotes');
      const key = this.string(true);
      this.whitespace();
      if (this.text[this.i] !== ':') this.fail(`expected ':' after property name "${key}"`);
      this.i += 1;
      this.value(node?.children?.get(key));
      this.whitespace();
      const c = this.text[this.i];
      this.i += 1;
      if (c === ',') continue;
      if (c === '}') return;
      this.i -= 1;
      this.fail(`expected ',' or '}' after the value of "${key}"`);
    }
  }

  private array(node: PathNode | undefined): void {
    this.i += 1;
    this.whitespace();
    if (this.text[this.i] === ']') {
      this.i += 1;
      return;
    }
    for (let index = 0; ; index++) {
      this.value(node ? (node.children?.get(String(index)) ?? node.each ?? undefined) : undefined);
      this.whitespace();
      const c = this.text[this.i];
      this.i += 1;
      if (c === ',') continue;
      if (c === ']') return;
      this.i -= 1;
      this.fail(`expected ',' or ']' after array element ${index}`);
    }
  }

  private string(decode: boolean): string {
    const text = this.text;
    const start = this.i;
    let escaped = false;
    this.i += 1;
    for (;;) {
      const c = text.charCodeAt(this.i);
      if (Number.isNaN(c)) this.fail('unterminated string');
      if (c === 0x22) break;
      if (c < 0x20) {
        this.fail(c === 0x0a ? 'line break inside a string' : 'control character inside a string');
      }
      if (c === 0x5c) {
        escaped = true;
        const next = text[this.i + 1] ?? '';
        if (next === 'u') {
          if (!HEX4.test(text.slice(this.i + 2, this.i + 6))) this.fail('bad \\u escape in string');
          this.i += 6;
          continue;
        }
        if (!ESCAPES.has(next)) this.fail(`bad escape '\\${next}' in string`);
        this.i += 2;
        continue;
      }
      this.i += 1;
    }
    this.i += 1;
    if (!decode) return '';
    return escaped
      ? (JSON.parse(text.slice(start, this.i)) as string)
      : text.slice(start + 1, this.i - 1);
  }

  private number(): void {
    NUMBER.lastIndex = this.i;
    const match = NUMBER.exec(this.text);
    if (!match || match[0] === '-') this.fail('invalid number');
    this.i += match[0].length;
  }

  private literal(word: string): void {
    if (this.text.startsWith(word, this.i)) this.i += word.length;
    else this.fail(`unexpected character '${this.text[this.i]}' where a value should start`);
  }
}

function pathTree(paths: readonly (readonly PathSegment[])[]): PathNode {
  const root = pathNode();
  for (const path of paths) {
    let node = root;
    for (const segment of path) {
      const key = String(segment);
      node.children ??= new Map();
      let child = node.children.get(key);
      if (!child) {
        child = pathNode();
        node.children.set(key, child);
      }
      node = child;
    }
  }
  return root;
}

/** Line of each path's value; for a path that is absent, the line of its nearest present parent. */
function linesOf(text: string, paths: readonly (readonly PathSegment[])[]): (number | null)[] {
  const root = pathTree(paths);
  try {
    new JsonLineScanner(text).scan(root);
  } catch {
    // Deep nesting can exhaust the stack; lines are a courtesy, so fall back to none.
    return paths.map(() => null);
  }
  return paths.map((path) => {
    let node: PathNode | undefined = root;
    let line = root.line;
    for (const segment of path) {
      node = node.children?.get(String(segment));
      if (!node || node.line === null) break;
      line = node.line;
    }
    return line;
  });
}

/** `components[3].pins[0].net`, the way a reader of the file would point at a value. */
export function formatJsonPath(path: readonly PathSegment[]): string {
  let out = '';
  for (const segment of path) {
    if (typeof segment === 'number') out += `[${segment}]`;
    else if (/^[A-Za-z_$][\w$]*$/.test(segment)) out += out === '' ? segment : `.${segment}`;
    else out += `[${JSON.stringify(segment)}]`;
  }
  return out;
}

type Parsed = { ok: true; value: unknown } | { ok: false; issue: ImportIssue };

function parseJson(text: string): Parsed {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    try {
      new JsonLineScanner(text).scan(undefined);
    } catch (scanError) {
      if (scanError instanceof JsonSyntaxError) {
        return {
          ok: false,
          issue: {
            line: scanError.line,
            field: null,
            message: `JSON syntax: ${scanError.message}`,
          },
        };
      }
    }
    // The scanner found nothing JSON.parse objects to: use JSON.parse's own position, if any.
    const message = error instanceof Error ? error.message : String(error);
    const position = /at position (\d+)/.exec(message);
    const line = position ? text.slice(0, Number(position[1])).split('\n').length : null;
    return { ok: false, issue: { line, field: null, message: `JSON syntax: ${message}` } };
  }
}

function zodIssues(text: string, issues: readonly z.core.$ZodIssue[]): ImportIssue[] {
  const paths = issues.map((issue) => {
    const path = issue.path.map((s) => (typeof s === 'symbol' ? String(s) : s));
    // An unknown key is easier to find when the field names the key itself.
    if (
      issue.code === 'unrecognized_keys' &&
      issue.keys.length === 1 &&
      issue.keys[0] !== undefined
    ) {
      path.push(issue.keys[0]);
    }
    return path;
  });
  const lines = linesOf(text, paths);
  return issues.map((issue, k) => ({
    line: lines[k] ?? null,
    field: formatJsonPath(paths[k] ?? []) || null,
    message: issue.message,
  }));
}

interface Duplicate {
  path: PathSegment[];
  message: (firstLine: number | null, line: number | null) => string;
  firstPath: PathSegment[];
}

/** Turns duplicate findings into issues, locating both occurrences in one scan. */
function duplicateIssues(text: string, duplicates: Duplicate[]): ImportIssue[] {
  if (duplicates.length === 0) return [];
  const lines = linesOf(
    text,
    duplicates.flatMap((d) => [d.firstPath, d.path]),
  );
  return duplicates.map((d, k) => {
    const first = lines[2 * k] ?? null;
    const line = lines[2 * k + 1] ?? null;
    return { line, field: formatJsonPath(d.path), message: d.message(first, line) };
  });
}

const at = (line: number | null) => (line === null ? '' : ` (line ${line})`);

function findDuplicateNames(
  items: readonly { name: string }[],
  arrayKey: string,
  nameKey: string,
  what: string,
): Duplicate[] {
  const firstIndex = new Map<string, number>();
  const duplicates: Duplicate[] = [];
  items.forEach((item, index) => {
    const earlier = firstIndex.get(item.name);
    if (earlier === undefined) {
      firstIndex.set(item.name, index);
      return;
    }
    duplicates.push({
      firstPath: [arrayKey, earlier, nameKey],
      path: [arrayKey, index, nameKey],
      message: (first, line) =>
        `${what} ${item.name} appears twice: ${arrayKey}[${earlier}]${at(first)} and ${arrayKey}[${index}]${at(line)}`,
    });
  });
  return duplicates;
}

/** Only the metadata keys the file actually gave, so schema defaults do not blank a board's details. */
function givenMeta(raw: unknown, parsed: Partial<BoardMeta> | undefined): Partial<BoardMeta> {
  const meta: Partial<BoardMeta> = {};
  if (!parsed || typeof raw !== 'object' || raw === null) return meta;
  const board = (raw as { board?: unknown }).board;
  if (typeof board !== 'object' || board === null) return meta;
  for (const key of Object.keys(parsed) as (keyof BoardMeta)[]) {
    if (Object.hasOwn(board, key)) Object.assign(meta, { [key]: parsed[key] });
  }
  return meta;
}

/**
 * Gives each component and pin the line where it starts, so later checks (kinds, power links)
 * can point into the file. One scan with shared element nodes, not one path per pin.
 */
function attachLines(text: string, components: RawComponent[]): void {
  const componentNode = pathNode();
  const pinNode = pathNode();
  componentNode.seen = [];
  pinNode.seen = [];
  componentNode.children = new Map([['pins', { ...pathNode(), each: pinNode }]]);
  const root = pathNode();
  root.children = new Map([['components', { ...pathNode(), each: componentNode }]]);
  try {
    new JsonLineScanner(text).scan(root);
  } catch {
    return;
  }
  const componentLines = componentNode.seen;
  const pinLines = pinNode.seen;
  // A key written twice (JSON.parse keeps the last) would shift the lines: then give none.
  const pinCount = components.reduce((sum, c) => sum + c.pins.length, 0);
  if (componentLines.length !== components.length || pinLines.length !== pinCount) return;
  let p = 0;
  components.forEach((component, c) => {
    const line = componentLines[c];
    if (line !== undefined) component.line = line;
    for (const pin of component.pins) {
      const pinLine = pinLines[p++];
      if (pinLine !== undefined) pin.line = pinLine;
    }
  });
}

const emptyNetlist = (errors: ImportIssue[]): NetlistRead => ({
  meta: {},
  components: [],
  netAliases: {},
  warnings: [],
  errors,
});

export function readBoardFile(text: string): {
  netlist: NetlistRead;
  annotations: AnnotationFile | null;
} {
  const source = text.replace(/^\uFEFF/, '');
  const parsed = parseJson(source);
  if (!parsed.ok) return { netlist: emptyNetlist([parsed.issue]), annotations: null };
  const result = boardFileSchema.safeParse(parsed.value);
  if (!result.success) {
    return { netlist: emptyNetlist(zodIssues(source, result.error.issues)), annotations: null };
  }
  const file = result.data;

  const duplicates = [
    ...findDuplicateNames(
      file.components.map((c) => ({ name: c.refdes })),
      'components',
      'refdes',
      'refdes',
    ),
    ...findDuplicateNames(file.nets, 'nets', 'name', 'net'),
  ];
  file.components.forEach((component, c) => {
    const firstIndex = new Map<string, number>();
    component.pins.forEach((pin, p) => {
      const earlier = firstIndex.get(pin.pin);
      if (earlier === undefined) {
        firstIndex.set(pin.pin, p);
        return;
      }
      duplicates.push({
        firstPath: ['components', c, 'pins', earlier, 'pin'],
        path: ['components', c, 'pins', p, 'pin'],
        message: (first, line) =>
          `${component.refdes} lists pin ${pin.pin} twice: pins[${earlier}]${at(first)} and pins[${p}]${at(line)}`,
      });
    });
  });
  const errors = duplicateIssues(source, duplicates);
  if (errors.length > 0) return { netlist: emptyNetlist(errors), annotations: null };

  const components: RawComponent[] = file.components.map((component) => ({
    ...component,
    pins: component.pins.map((pin) => ({ ...pin })),
  }));
  attachLines(source, components);

  const meta = givenMeta(parsed.value, file.board);
  const annotations: AnnotationFile = {
    format: 'railyard-annotations',
    version: 1,
    ...(file.board ? { board: meta } : {}),
    ...(file.rootNet !== undefined ? { rootNet: file.rootNet } : {}),
    nets: file.nets,
    components: [],
    powerLinks: file.powerLinks,
  };
  return {
    netlist: { meta, components, netAliases: {}, warnings: [], errors: [] },
    annotations,
  };
}

export function readAnnotationFile(text: string): {
  annotations: AnnotationFile | null;
  errors: ImportIssue[];
} {
  const source = text.replace(/^\uFEFF/, '');
  const parsed = parseJson(source);
  if (!parsed.ok) return { annotations: null, errors: [parsed.issue] };
  const result = annotationFileSchema.safeParse(parsed.value);
  if (!result.success) {
    return { annotations: null, errors: zodIssues(source, result.error.issues) };
  }
  const file = result.data;
  const errors = duplicateIssues(source, [
    ...findDuplicateNames(
      file.components.map((c) => ({ name: c.refdes })),
      'components',
      'refdes',
      'refdes',
    ),
    ...findDuplicateNames(file.nets, 'nets', 'name', 'net'),
  ]);
  if (errors.length > 0) return { annotations: null, errors };
  const { board, ...rest } = file;
  return {
    annotations: { ...rest, ...(board ? { board: givenMeta(parsed.value, board) } : {}) },
    errors: [],
  };
}
