// Number formatting for results: significant figures, SI prefixes where engineers use them, and
// powers of ten written with a real × and superscripts (4.56 × 10⁻⁸ m/s²).

const superscriptDigits: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

/** `-8` as `⁻⁸`. */
export function superscript(exponent: number): string {
  return String(exponent)
    .split('')
    .map((c) => superscriptDigits[c] ?? c)
    .join('');
}

/** Units written the API's way (`m/s^2`, `N*m`) in typographic form (`m/s²`, `N·m`); `-` is no unit. */
export function formatUnit(unit: string): string {
  if (unit === '-' || unit === '') return '';
  return unit
    .replace(/\^(-?\d+)/g, (_m, exp: string) => superscript(Number(exp)))
    .replace(/\*/g, '·');
}

/** Options of formatNumber. */
export interface FormatNumberOptions {
  /** Significant figures, 3 unless given. */
  digits?: number;
  /** Below this magnitude powers of ten are used. Default 1e-3. */
  small?: number;
  /** At or above this magnitude powers of ten are used. Default 1e6. */
  large?: number;
}

/**
 * A number with `digits` significant figures: plain between 1e-3 and 1e6 (`0.0123`, `4560`,
 * `12 300`), otherwise as a power of ten (`4.56 × 10⁻⁸`). Trailing zeros of the mantissa are kept
 * (they are significant). Minus signs are real minus signs. NaN and infinities read as such.
 */
export function formatNumber(value: number, { digits = 3, small = 1e-3, large = 1e6 }: FormatNumberOptions = {}): string {
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const sign = value < 0 ? '−' : '';
  const abs = Math.abs(value);
  // Round first: 9.996e-4 at 3 figures becomes 1.00e-3 and must then print plainly.
  const [mantissaText, exponentText] = abs.toExponential(Math.max(0, digits - 1)).split('e');
  const exponent = Number(exponentText);
  const rounded = Number(`${mantissaText}e${exponent}`);
  if (rounded < small || rounded >= large) {
    return `${sign}${mantissaText} × 10${superscript(exponent)}`;
  }
  const decimals = Math.max(0, digits - 1 - exponent);
  return `${sign}${groupThousands(rounded.toFixed(decimals))}`;
}

function groupThousands(text: string): string {
  const [whole = '', fraction] = text.split('.');
  // Thin spaces between groups of three, only from 10 000 up (4560 stays 4560).
  const grouped = whole.length > 4 ? whole.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009') : whole;
  return fraction === undefined ? grouped : `${grouped}.${fraction}`;
}

/** A number with its unit, e.g. `4.56 × 10⁻⁸ m/s²`; no unit for `-`. */
export function formatQuantity(value: number | null | undefined, unit: string, options?: FormatNumberOptions): string {
  if (value === null || value === undefined) return '—';
  const u = formatUnit(unit);
  return u ? `${formatNumber(value, options)} ${u}` : formatNumber(value, options);
}

const siPrefixes: ReadonlyArray<readonly [number, string]> = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
];

/**
 * A value of a simple unit (`N`, `N·m`, `m`) with an SI prefix chosen so the mantissa lies in
 * [1, 1000): `3.2e-6` N → `3.20 µN`. Outside n..G, a power of ten instead.
 */
export function formatSi(value: number, unit: string, digits = 3): string {
  const abs = Math.abs(value);
  if (!Number.isFinite(value) || value === 0 || abs >= 999.5e9 || abs < 1e-9) return formatQuantity(value, unit, { digits });
  // Compare after rounding, so 999.96 µ reads as 1.00 m rather than 1000 µ.
  const rounded = Number(abs.toPrecision(digits));
  const [scale, prefix] = siPrefixes.find(([s]) => rounded >= s) ?? [1e-9, 'n'];
  return `${formatNumber(value / scale, { digits, small: 0, large: Infinity })} ${prefix}${formatUnit(unit)}`;
}

/** Percent with one decimal under 100 and sign shown, e.g. `+12.5 %`, `−3.0 %`, `+250 %`. */
export function formatPercent(value: number): string {
  if (!Number.isFinite(value)) return '—';
  const sign = value > 0 ? '+' : value < 0 ? '−' : '';
  const abs = Math.abs(value);
  const text = abs >= 100 ? Math.round(abs).toString() : abs.toFixed(1);
  return `${sign}${groupThousands(text)} %`;
}
