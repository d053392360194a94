/** `YYYY-MM-DD HH:MM:SS UTC` of an ISO instant (or of epoch ms); the input unchanged if not a date. */
export function formatUtc(value: string | number, { seconds = true }: { seconds?: boolean } = {}): string {
  const date = new Date(value);
  if (Number.isNaN(date.getTime())) return String(value);
  const iso = date.toISOString();
  return `${iso.slice(0, 10)} ${iso.slice(11, seconds ? 19 : 16)} UTC`;
}

/** A duration in seconds as `2 d 03 h`, `3 h 04 min`, `4 min 05 s` or `6.2 s`. */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return '—';
  const sign = seconds < 0 ? '−' : '';
  const s = Math.abs(seconds);
  if (s < 60) return `${sign}${s < 10 ? s.toFixed(1) : Math.round(s).toString()} s`;
  const total = Math.round(s);
  const days = Math.floor(total / 86_400);
  const hours = Math.floor((total % 86_400) / 3600);
  const minutes = Math.floor((total % 3600) / 60);
  const secs = total % 60;
  const pad = (n: number) => n.toString().padStart(2, '0');
  if (days > 0) return `${sign}${days} d ${pad(hours)} h`;
  if (hours > 0) return `${sign}${hours} h ${pad(minutes)} min`;
  return `${sign}${minutes} min ${pad(secs)} s`;
}

/** Seconds from `from` to `to` (now when absent); null when `from` is absent. */
export function secondsBetween(from: string | null, to: string | null, now: number = Date.now()): number | null {
  if (!from) return null;
  const start = Date.parse(from);
  const end = to ? Date.parse(to) : now;
  if (Number.isNaN(start) || Number.isNaN(end)) return null;
  return Math.max(0, (end - start) / 1000);
}
