// Net kinds are told apart by a glyph and a word as well as colour, so they stay
// distinct for colour-blind readers, on a dim bench monitor and under a magnifier.
import type { NetKind } from '@railyard/shared';

export const netKindLabel: Record<NetKind, string> = {
  power: 'power',
  ground: 'ground',
  signal: 'signal',
};

/** The order kinds are listed in: the rails a technician checks first come first. */
export const netKindOrder = Object.keys(netKindLabel) as NetKind[];

export const netKindTone: Record<NetKind, string> = {
  power: 'text-power bg-power-soft border-power/35',
  ground: 'text-ground bg-ground-soft border-ground/35',
  signal: 'text-signal bg-signal-soft border-signal/25',
};

export function NetKindGlyph({ kind, size = 12 }: { kind: NetKind; size?: number }) {
  return (
    <svg
      viewBox="0 0 12 12"
      width={size}
      height={size}
      aria-hidden="true"
      className="shrink-0"
      fill="none"
      stroke="currentColor"
      strokeWidth="1.5"
      strokeLinecap="round"
    >
      {kind === 'power' && <path d="M2.5 2.5h7M6 2.5v8" />}
      {kind === 'ground' && <path d="M6 1.5v4M2 5.5h8M3.5 8h5M5 10.5h2" />}
      {kind === 'signal' && <path d="M1 9h2.5V3h5v6H11" strokeLinejoin="round" />}
    </svg>
  );
}

export function NetKindBadge({ kind }: { kind: NetKind }) {
  return (
    <span
      className={`inline-flex h-5 items-center gap-1 rounded border px-1.5 text-[11.5px] leading-none font-medium ${netKindTone[kind]}`}
    >
      <NetKindGlyph kind={kind} size={11} />
      {netKindLabel[kind]}
    </span>
  );
}
