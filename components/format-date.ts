/** Dates as the screens show them. */

/** Short local date and time of an ISO timestamp; the ISO text itself if it cannot be read. */
export function formatDate(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}
