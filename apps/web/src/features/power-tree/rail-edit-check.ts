// What a moderator typed into the rail editor, checked before it is sent: the same limits the API
// applies (packages/shared/src/board-edits.ts), said next to the field that breaks them.
import type { NetRow } from '@railyard/shared';

/** The contract's range for a nominal voltage, in volts. */
export const voltageLimit = 1000;

export type VoltsReading = { ok: true; volts: number | null } | { ok: false; error: string };

/**
 * A nominal voltage as typed: "3.3", "3,3", "3.3 V", "-5V"; empty means "not known" (null).
 * A decimal comma is read as a point: benches in much of the world write volts that way.
 */
export function readVolts(text: string): VoltsReading {
  const trimmed = text.trim().replace(/\s*[vV]$/, '');
  if (trimmed === '') return { ok: true, volts: null };
  const normal = trimmed.replace(',', '.').replace(/^\u2212/, '-');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(normal)) {
    return {
      ok: false,
      error: 'Write the voltage as a number of volts, e.g. 3.3; leave it empty when not known.',
    };
  }
  const volts = Number(normal);
  if (Math.abs(volts) > voltageLimit) {
    return {
      ok: false,
      error: `A nominal voltage lies between −${voltageLimit} V and ${voltageLimit} V.`,
    };
  }
  return { ok: true, volts };
}

/** The board's net a typed name stands for: its printed name or an alias, in any case. */
export function findNet(nets: readonly NetRow[], typed: string): NetRow | undefined {
  const wanted = typed.trim().toUpperCase();
  if (wanted === '') return undefined;
  return (
    nets.find((net) => net.name.toUpperCase() === wanted) ??
    nets.find((net) => net.aliases.some((alias) => alias.toUpperCase() === wanted))
  );
}

export type LinkFields = { otherNet: string; via: string };
export type LinkFieldErrors = Partial<Record<keyof LinkFields, string>>;

/**
 * Problems with a new link's other end and part. `nets` is undefined while the board's nets load:
 * the API then has the last word on whether the net exists.
 */
export function checkNewLink(
  fields: LinkFields,
  rail: string,
  nets: readonly NetRow[] | undefined,
): LinkFieldErrors {
  const errors: LinkFieldErrors = {};
  const other = fields.otherNet.trim();
  if (other === '') errors.otherNet = 'Choose the net at the other end of the link.';
  else if (nets) {
    const found = findNet(nets, other);
    if (!found) errors.otherNet = `No net called “${other}” on this board.`;
    else if (found.name === rail) errors.otherNet = 'A power link joins two different nets.';
  }
  if (fields.via.trim() === '') errors.via = 'Name the part the power passes through, e.g. U7.';
  return errors;
}
