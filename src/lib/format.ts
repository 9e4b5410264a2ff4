// Date, date-and-time, "5 minutes ago" and plain counts formats used across the designer app.
const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const timeFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

export const formatDate = (iso: string) => dateFormat.format(new Date(iso));
export const formatDateTime = (iso: string) => timeFormat.format(new Date(iso));

/** "just now", "5 minutes ago", "3 days ago", then a date. */
export function formatRelative(iso: string, now = Date.now()): string {
  const s = Math.round((now - new Date(iso).getTime()) / 1000);
  if (s < 60) return 'just now';
  const m = Math.round(s / 60);
  if (m < 60) return `${m} minute${m === 1 ? '' : 's'} ago`;
  const h = Math.round(m / 60);
  if (h < 24) return `${h} hour${h === 1 ? '' : 's'} ago`;
  const d = Math.round(h / 24);
  if (d < 14) return `${d} day${d === 1 ? '' : 's'} ago`;
  return formatDate(iso);
}

/** A count with its thousands grouped as the reader (this browser's language) writes them: "340,000". */
export function formatCount(n: number): string {
  return n.toLocaleString(typeof navigator === 'undefined' ? undefined : navigator.language || undefined);
}
