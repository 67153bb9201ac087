// Dates of the API (ISO 8601 strings) as short, readable text.

const FORMAT = new Intl.DateTimeFormat('en-GB', { year: 'numeric', month: 'short', day: '2-digit', hour: '2-digit', minute: '2-digit', timeZoneName: 'short' });

/** "2026-03-04T10:00:00Z" -> "04 Mar 2026, 10:00 UTC" (the reader's time zone); an unreadable value is shown as it is. */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : FORMAT.format(date);
}
