import { describe, expect, it } from 'vitest';
import { formatFixed } from './number-format';

describe('formatFixed', () => {
  it.each([
    [0, 3, '0.000'],
    [-0, 3, '0.000'],
    [-0.0004, 3, '0.000'],
    [1.23456, 3, '1.235'],
    [-7_000_000, 3, '-7000000.000'],
    [7546.0532, 6, '7546.053200'],
    [149_597_870_700.25, 1, '149597870700.3'],
    [42, 0, '42'],
  ])('prints %d with %d decimals as %s, as toFixed does away from ties', (x, digits, text) => {
    expect(formatFixed(x, digits)).toBe(text);
  });

  it('agrees with toFixed to one unit in the last place on 10 000 random values up to 1e12', () => {
    for (let i = 0; i < 10_000; i += 1) {
      const x = (Math.random() - 0.5) * 10 ** (Math.random() * 12);
      // A tie (or a product x·1000 rounded onto one) may go either way: compare in units of the
      // last place, exactly, as integers.
      const units = (s: string): bigint => BigInt(s.replace('.', ''));
      const diff = units(formatFixed(x, 3)) - units(x.toFixed(3));
      expect(diff >= -1n && diff <= 1n, `${x}`).toBe(true);
    }
  });

  it('falls back to toFixed beyond 9e15 units', () => {
    expect(formatFixed(1e15, 3)).toBe((1e15).toFixed(3));
  });
});
