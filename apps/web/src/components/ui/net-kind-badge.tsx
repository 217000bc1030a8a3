// Net kinds are told apart by a glyph and a word as well as colour, so they stay
// distinct for colour-blind readers, on a dim bench monitor and under a magnifier.
import type { NetKind } from '@railyard/shared';
import { Badge } from './badge';
import { StrokeGlyph } from './glyph';

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
    <StrokeGlyph size={size}>
      {kind === 'power' && <path d="M2.5 2.5h7M6 2.5v8" />}
      {kind === 'ground' && <path d="M6 1.5v4M2 5.5h8M3.5 8h5M5 10.5h2" />}
      {kind === 'signal' && <path d="M1 9h2.5V3h5v6H11" />}
    </StrokeGlyph>
  );
}

export function NetKindBadge({ kind }: { kind: NetKind }) {
  return (
    <Badge tone={netKindTone[kind]}>
      <NetKindGlyph kind={kind} size={11} />
      {netKindLabel[kind]}
    </Badge>
  );
}
