// Moments as people in a workshop log them: year first (ISO 8601 order, no day/month confusion),
// 24-hour clock, in the reader's own time zone unless one is given.

const formats = new Map<string, Intl.DateTimeFormat>();

function formatFor(timeZone: string | undefined): Intl.DateTimeFormat {
  const key = timeZone ?? '';
  let format = formats.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
      timeZone,
    });
    formats.set(key, format);
  }
  return format;
}

/** "2025-03-01 14:05"; blank for a missing or unreadable time. */
export function formatDateTime(iso: string | null | undefined, timeZone?: string): string {
  if (!iso) return '';
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  const part = Object.fromEntries(
    formatFor(timeZone)
      .formatToParts(date)
      .map((p) => [p.type, p.value]),
  );
  return `${part.year}-${part.month}-${part.day} ${part.hour}:${part.minute}`;
}
