// Time a repair took, as people write it on a job sheet: "45", "1:35", "1 h 35 min", "2h".
// The API keeps whole minutes.

export type MinutesRead = { ok: true; minutes: number | null } | { ok: false; error: string };

// After hours, the minutes may come without their unit: "1h 35".
const hoursAndMinutes = /^(?:(\d+)\s*h(?:ours?|rs?)?)?\s*(?:(\d+)\s*(?:m(?:in(?:utes?)?)?)?)?$/i;

/** Blank is "not recorded" (null). */
export function readMinutes(raw: string): MinutesRead {
  const text = raw.trim();
  if (text === '') return { ok: true, minutes: null };
  if (/^\d+$/.test(text)) return { ok: true, minutes: Number(text) };
  const clock = /^(\d+):([0-5]\d)$/.exec(text);
  if (clock) return { ok: true, minutes: Number(clock[1]) * 60 + Number(clock[2]) };
  const spelled = hoursAndMinutes.exec(text);
  if (spelled && (spelled[1] !== undefined || spelled[2] !== undefined)) {
    return { ok: true, minutes: Number(spelled[1] ?? 0) * 60 + Number(spelled[2] ?? 0) };
  }
  return { ok: false, error: 'write whole minutes (95), or hours and minutes (1:35, 1 h 35 min)' };
}

/** "35 min", "1 h 35 min", "2 h"; blank when not recorded. */
export function formatMinutes(minutes: number | null | undefined): string {
  if (minutes === null || minutes === undefined || !Number.isFinite(minutes) || minutes < 0) {
    return '';
  }
  const hours = Math.floor(minutes / 60);
  const rest = Math.round(minutes - hours * 60);
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}
