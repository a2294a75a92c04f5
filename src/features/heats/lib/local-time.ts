// <input type="datetime-local"> speaks the device's local time without an
// offset ("2026-11-28T18:30"); the API speaks UTC instants. These convert.

const pad = (n: number) => String(n).padStart(2, '0');

/** An instant as datetime-local text in the device's time zone, to the minute. */
export function localInputOf(date: Date | string | null | undefined): string {
  if (!date) return '';
  const d = typeof date === 'string' ? new Date(date) : date;
  if (Number.isNaN(d.getTime())) return '';
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** datetime-local text as an ISO instant (UTC), or null when it is empty or not a time. */
export function isoOfLocalInput(text: string): string | null {
  if (!text.trim()) return null;
  const d = new Date(text);
  return Number.isNaN(d.getTime()) ? null : d.toISOString();
}
