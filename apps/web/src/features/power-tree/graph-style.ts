// Railyard's own drawing scheme for the power tree, built from the theme's CSS variables so the
// canvas matches the page in both themes. Every distinction has a second cue besides colour:
// net kind → node shape (power rounded, ground barrel, signal square-cornered and dashed);
// link kind → line style and arrow head (converter solid with a plain head, switch dashed with a
// barred head, series a hollow double line: the same rail carried on through an inductor,
// ferrite, fuse or 0 Ω link). The followed rail is lit in the theme's lamp colour, which the
// Railyard mark also uses for "the rail being followed".
import type { StylesheetJson } from 'cytoscape';
import { loadsFontSize, railFontSize } from './tree-elements';

export type GraphTokens = {
  canvas: string;
  surface: string;
  raised: string;
  line: string;
  lineStrong: string;
  ink: string;
  inkMuted: string;
  inkFaint: string;
  accent: string;
  accentInk: string;
  lamp: string;
  power: string;
  ground: string;
  signal: string;
  caution: string;
};

// Used when a variable is missing (a test page without the stylesheet): the dark theme's values.
const fallback: GraphTokens = {
  canvas: '#0b0e11',
  surface: '#161a20',
  raised: '#1d232b',
  line: '#29303a',
  lineStrong: '#3a4450',
  ink: '#e7eaed',
  inkMuted: '#a3adb8',
  inkFaint: '#76818d',
  accent: '#4fd1b5',
  accentInk: '#06201a',
  lamp: '#f2b441',
  power: '#ffa27f',
  ground: '#aab8ff',
  signal: '#c3cbd3',
  caution: '#f5c96a',
};

const variables: Record<keyof GraphTokens, string> = {
  canvas: '--ry-sunken',
  surface: '--ry-surface',
  raised: '--ry-raised',
  line: '--ry-line',
  lineStrong: '--ry-line-strong',
  ink: '--ry-ink',
  inkMuted: '--ry-ink-muted',
  inkFaint: '--ry-ink-faint',
  accent: '--ry-accent',
  accentInk: '--ry-accent-ink',
  lamp: '--ry-lamp',
  power: '--ry-power',
  ground: '--ry-ground',
  signal: '--ry-signal',
  caution: '--ry-caution',
};

/**
 * Cytoscape reads hex and comma-separated rgb() only; the theme may write `rgb(r g b / a)`.
 * Returns `#rrggbb` (any alpha dropped: fills get their opacity from the stylesheet) or null.
 */
export function cssColorToHex(value: string): string | null {
  const text = value.trim().toLowerCase();
  const hex = /^#([0-9a-f]{3}|[0-9a-f]{6})$/.exec(text);
  if (hex) {
    const digits = hex[1] ?? '';
    return digits.length === 3 ? `#${[...digits].map((d) => d + d).join('')}` : `#${digits}`;
  }
  const rgb = /^rgba?\(\s*(\d+)[\s,]+(\d+)[\s,]+(\d+)/.exec(text);
  if (rgb) {
    const channels = rgb.slice(1, 4).map((c) => Math.min(255, Number(c)));
    return `#${channels.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
  }
  return null;
}

/** The current theme's colours, read from the root element's computed style. */
export function readGraphTokens(root: Element = document.documentElement): GraphTokens {
  const style = getComputedStyle(root);
  const tokens = { ...fallback };
  for (const [token, variable] of Object.entries(variables) as [keyof GraphTokens, string][]) {
    tokens[token] = cssColorToHex(style.getPropertyValue(variable)) ?? fallback[token];
  }
  return tokens;
}

/** `#rrggbb` of `share` parts `over` laid on `base`: an opaque tint, so links pass behind nodes. */
export function mixHex(base: string, over: string, share: number): string {
  const channel = (hex: string, i: number) => parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16);
  const mixed = [0, 1, 2].map((i) =>
    Math.round(channel(base, i) * (1 - share) + channel(over, i) * share),
  );
  return `#${mixed.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
}

// Double quotes: cytoscape's font-family parser refuses single-quoted names.
const monoFont = '"JetBrains Mono", ui-monospace, Menlo, monospace';
const sansFont = '"IBM Plex Sans", ui-sans-serif, system-ui, sans-serif';

export function graphStylesheet(t: GraphTokens, theme: 'dark' | 'light'): StylesheetJson {
  // Tinted fills need more strength on a dark canvas to read as tinted at all.
  const tint = theme === 'dark' ? 0.16 : 0.1;
  const fill = (colour: string, share = tint) => mixHex(t.surface, colour, share);
  return [
    {
      selector: 'node',
      style: {
        width: 'data(w)',
        height: 'data(h)',
        label: 'data(label)',
        'text-wrap': 'wrap',
        'text-valign': 'center',
        'text-halign': 'center',
        color: t.ink,
        'font-family': monoFont,
        'font-size': railFontSize,
        'line-height': 1.25,
        'overlay-opacity': 0,
      },
    },
    {
      selector: 'node.rail',
      style: {
        shape: 'round-rectangle',
        'corner-radius': '7px',
        'background-color': fill(t.power),
        'border-width': 1.5,
        'border-color': t.power,
      },
    },
    {
      selector: 'node.rail.net-ground',
      style: { shape: 'barrel', 'background-color': fill(t.ground), 'border-color': t.ground },
    },
    {
      selector: 'node.rail.net-signal',
      style: {
        shape: 'rectangle',
        'background-color': fill(t.signal, tint * 0.6),
        'border-color': t.signal,
        'border-style': 'dashed',
      },
    },
    // Only while dagre runs: the rail and its loads leaf take the room of one block.
    { selector: 'node.rail.layout-block', style: { width: 'data(blockWidth)' } },
    // The rail the drawing starts from: a double frame.
    { selector: 'node.rail.start', style: { 'border-style': 'double', 'border-width': 4.5 } },
    {
      selector: 'node.rail:active',
      style: { 'overlay-color': t.accent, 'overlay-opacity': 0.14, 'overlay-padding': 3 },
    },
    {
      selector: 'node.rail.in-group',
      style: {
        'outline-color': t.lamp,
        'outline-width': 2,
        'outline-style': 'dotted',
        'outline-offset': 3,
      },
    },
    { selector: 'node.rail.on-path', style: { 'border-color': t.lamp, 'border-width': 2.5 } },
    {
      selector: 'node.rail.selected',
      style: {
        'border-color': t.lamp,
        'border-width': 3,
        'background-color': fill(t.lamp, theme === 'dark' ? 0.24 : 0.18),
        'underlay-color': t.lamp,
        'underlay-opacity': theme === 'dark' ? 0.22 : 0.18,
        'underlay-padding': 7,
        'underlay-shape': 'round-rectangle',
        'font-weight': 600,
        'z-index': 10,
      },
    },
    {
      selector: 'node.marker',
      style: {
        shape: 'round-rectangle',
        'corner-radius': '8px',
        'font-family': sansFont,
        'font-size': 11,
        'font-weight': 600,
        'line-height': 1,
        'text-margin-y': 0.5,
        'background-color': t.accent,
        'background-opacity': 1,
        color: t.accentInk,
        'border-width': 1,
        'border-color': t.accent,
        'z-index': 20,
      },
    },
    {
      selector: 'node.marker.expanded',
      style: { 'background-color': t.surface, color: t.accent },
    },
    {
      selector: 'node.marker.deeper',
      style: { 'background-color': t.caution, 'border-color': t.caution, color: t.canvas },
    },
    {
      selector: 'node.marker:active',
      style: { 'overlay-color': t.accent, 'overlay-opacity': 0.25, 'overlay-padding': 3 },
    },
    {
      selector: 'node.loads',
      style: {
        shape: 'round-rectangle',
        'corner-radius': '4px',
        'font-size': loadsFontSize,
        'line-height': 1.2,
        color: t.inkMuted,
        'background-color': t.raised,
        'background-opacity': 1,
        'border-width': 1,
        'border-style': 'dotted',
        'border-color': t.lineStrong,
      },
    },
    {
      selector: 'edge',
      style: {
        'curve-style': 'taxi',
        'taxi-direction': 'downward',
        'taxi-turn': 22,
        'taxi-turn-min-distance': 10,
        'taxi-radius': 6,
        width: 1.75,
        'arrow-scale': 0.95,
        // The refdes sits on the last stretch into the fed rail: a shared bus of taxi lines below
        // a rail with many children would stack every label in one row.
        'target-label': 'data(via)',
        'target-text-offset': 22,
        'font-family': monoFont,
        'font-size': 10,
        color: t.inkMuted,
        'text-background-color': t.canvas,
        'text-background-opacity': 0.92,
        'text-background-padding': '2px',
        'text-background-shape': 'roundrectangle',
        // Refdes labels drop out when zoomed far out: unreadable there, and costly to draw.
        'min-zoomed-font-size': 8,
        'overlay-opacity': 0,
      },
    },
    {
      selector: 'edge.link-converter',
      style: {
        'line-color': t.power,
        'target-arrow-color': t.power,
        'target-arrow-shape': 'triangle',
      },
    },
    {
      selector: 'edge.link-switch',
      style: {
        'line-color': t.caution,
        'target-arrow-color': t.caution,
        'target-arrow-shape': 'triangle-tee',
        'line-style': 'dashed',
        'line-dash-pattern': [6, 4],
      },
    },
    {
      // A hollow double line: the canvas-coloured core inside an outline of the line colour.
      selector: 'edge.link-series',
      style: {
        width: 2.5,
        'line-color': t.canvas,
        'line-outline-width': 1.4,
        'line-outline-color': t.inkMuted,
        'target-arrow-color': t.inkMuted,
        'target-arrow-shape': 'square',
        'arrow-scale': 0.6,
      },
    },
    // A second link into a rail already reached: drawn as a curve so it reads as the extra way in.
    { selector: 'edge.cross', style: { 'curve-style': 'bezier' } },
    {
      selector: 'edge.on-path',
      style: {
        width: 3,
        'line-color': t.lamp,
        'target-arrow-color': t.lamp,
        color: t.ink,
        'z-index': 5,
      },
    },
    {
      selector: 'edge.link-series.on-path',
      style: { width: 3.5, 'line-color': t.canvas, 'line-outline-color': t.lamp },
    },
    {
      selector: 'edge.loads-link',
      style: {
        'curve-style': 'straight',
        width: 1,
        'line-color': t.lineStrong,
        'line-style': 'dotted',
        'target-arrow-shape': 'none',
        'target-label': '',
      },
    },
  ];
}
