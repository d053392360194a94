const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A number with `digits` significant figures: plain between 0.001 and 10⁶, else as
 * `m × 10ⁿ` with a true minus sign (U+2212); "–" for a non-finite value.
 */
export function formatSig(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const sign = value < 0 ? '−' : '';
  if (abs >= 1e-3 && abs < 1e6) {
    return sign + Number(abs.toPrecision(digits)).toLocaleString('en-GB', { maximumSignificantDigits: digits });
  }
  const [mantissa, exponent] = abs.toExponential(digits - 1).split('e');
  const power = String(Number(exponent)).split('').map((c) => SUPERSCRIPT[c] ?? c).join('');
  return `${sign}${mantissa} × 10${power}`;
}

/** A number and its unit, e.g. "1.09 × 10⁻⁷ m/s²". */
export function formatQuantity(value: number, unit: string, digits = 3): string {
  return unit ? `${formatSig(value, digits)} ${unit}` : formatSig(value, digits);
}

/** Elapsed time from the epoch as "12 d 03:25:00" (or "03:25:00" under a day). */
export function formatElapsed(seconds: number): string {
  if (!Number.isFinite(seconds)) return '–';
  const s = Math.max(0, Math.round(seconds));
  const days = Math.floor(s / 86_400);
  const rest = s - days * 86_400;
  const hh = String(Math.floor(rest / 3600)).padStart(2, '0');
  const mm = String(Math.floor((rest % 3600) / 60)).padStart(2, '0');
  const ss = String(rest % 60).padStart(2, '0');
  return days > 0 ? `${days} d ${hh}:${mm}:${ss}` : `${hh}:${mm}:${ss}`;
}

/**
 * The UTC label of the instant `tSeconds` after an ISO epoch, to the second: "2026-09-08 21:56:12 UTC".
 * Leap seconds inside the span are not counted (display only; the stored events carry exact labels).
 */
export function utcLabel(epochUtc: string, tSeconds: number): string {
  const ms = Date.parse(epochUtc) + Math.round(tSeconds) * 1000;
  if (!Number.isFinite(ms)) return '–';
  return `${new Date(ms).toISOString().slice(0, 19).replace('T', ' ')} UTC`;
}
