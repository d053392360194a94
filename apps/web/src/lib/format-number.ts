const superscripts: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/**
 * A number with `digits` significant figures: plain for magnitudes from 0.001 to 10⁶ (trailing
 * zeros dropped), otherwise as `1.234×10⁻⁷`; "—" for a non-finite value.
 */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e6) {
    return String(Number(value.toPrecision(digits)));
  }
  const [mantissa = '', exponent = ''] = value.toExponential(digits - 1).split('e');
  const power = String(Number(exponent))
    .split('')
    .map((c) => superscripts[c] ?? c)
    .join('');
  return `${String(Number(mantissa))}×10${power}`;
}

/** A vector as `[x, y, z]` with `digits` significant figures per component. */
export function formatVector(v: readonly number[], digits = 4): string {
  return `[${v.map((c) => formatNumber(c, digits)).join(', ')}]`;
}

/** The first 12 hex digits of a SHA-256, for display. */
export function shortSha(sha: string): string {
  return sha.slice(0, 12);
}
