// Link kinds drawn the way the graph draws them (see graph-style.ts), for lists and the legend.
import type { PowerLinkKind } from '@railyard/shared';

export const linkKindLabel: Record<PowerLinkKind, string> = {
  converter: 'converter',
  switch: 'switch',
  series: 'series',
};

export const linkKindHint: Record<PowerLinkKind, string> = {
  converter: 'a regulator makes a new voltage',
  switch: 'a load switch or MOSFET passes the rail on or off',
  series: 'an inductor, ferrite, fuse or 0 Ω link: electrically the same rail',
};

export function PowerLinkGlyph({ kind, width = 26 }: { kind: PowerLinkKind; width?: number }) {
  const end = width - 2;
  return (
    <svg
      viewBox={`0 0 ${width} 10`}
      width={width}
      height={10}
      aria-hidden="true"
      className="shrink-0"
    >
      {kind === 'converter' && (
        <g stroke="var(--ry-power)" fill="var(--ry-power)" strokeWidth="1.75">
          <path d={`M1 5H${end - 6}`} />
          <path d={`M${end - 7} 1.5 ${end} 5 ${end - 7} 8.5Z`} stroke="none" />
        </g>
      )}
      {kind === 'switch' && (
        <g stroke="var(--ry-caution)" fill="var(--ry-caution)" strokeWidth="1.75">
          <path d={`M1 5H${end - 8}`} strokeDasharray="4 2.5" />
          <path d={`M${end - 8} 1.5V8.5`} />
          <path d={`M${end - 6} 1.5 ${end} 5 ${end - 6} 8.5Z`} stroke="none" />
        </g>
      )}
      {kind === 'series' && (
        <g stroke="var(--ry-ink-muted)" fill="none" strokeWidth="1.2">
          <path d={`M1 3.4H${end - 4}M1 6.6H${end - 4}`} />
          <rect x={end - 4} y={2.5} width={4} height={5} fill="var(--ry-ink-muted)" stroke="none" />
        </g>
      )}
    </svg>
  );
}
