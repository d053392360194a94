/** The UTC calendar date of an ISO 8601 instant, `YYYY-MM-DD`; the input unchanged if it is not a date. */
export function formatUtcDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toISOString().slice(0, 10);
}
