/** Number formatting for the text exports (hot: 10⁶ rows × 18 columns). */

const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12];

/**
 * `x.toFixed(digits)` by integer arithmetic, about 2.5 times faster in V8 (measured: 1.2 s against
 * 3.2 s for 18 million numbers). Differs from toFixed only at exact ties, where it may round the
 * other way: the error stays within half a unit in the last place plus one rounding of x·10^digits.
 * Falls back to toFixed beyond 9e15 units. Never prints "-0.000".
 * @param digits 0 to 12
 */
export function formatFixed(x: number, digits: number): string {
  const scale = POW10[digits] as number;
  const n = Math.round(x * scale);
  if (!(n < 9e15 && n > -9e15)) return x.toFixed(digits);
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / scale);
  const s = digits === 0 ? `${whole}` : `${whole}.${String(a - whole * scale).padStart(digits, '0')}`;
  return n < 0 ? `-${s}` : s;
}
