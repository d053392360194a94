import { describe, expect, it } from 'vitest';
import { formatNumber, formatPercent, formatQuantity, formatSi, formatUnit } from './format-number';

describe('formatNumber', () => {
  it('writes a small acceleration as a power of ten with superscripts and a real ×', () => {
    expect(formatNumber(4.56e-8)).toBe('4.56 × 10⁻⁸');
    expect(formatQuantity(4.5612e-8, 'm/s^2')).toBe('4.56 × 10⁻⁸ m/s²');
  });

  it('keeps significant trailing zeros and the requested number of figures', () => {
    expect(formatNumber(0.5, { digits: 4 })).toBe('0.5000');
    expect(formatNumber(1255.00445, { digits: 4 })).toBe('1255');
    expect(formatNumber(2.4e-3)).toBe('0.00240');
  });

  it('rounds before choosing the notation (9.996e-4 at 3 figures is 0.00100, not 10.0 × 10⁻⁴)', () => {
    expect(formatNumber(9.996e-4)).toBe('0.00100');
    expect(formatNumber(999_999)).toBe('1.00 × 10⁶');
  });

  it('uses a real minus sign and groups thousands from 10 000 with thin spaces', () => {
    expect(formatNumber(-2.3639e-5)).toBe('−2.36 × 10⁻⁵');
    expect(formatNumber(12_345)).toBe('12\u2009300');
    expect(formatNumber(4560)).toBe('4560');
  });

  it('reads zero, NaN and infinities as such', () => {
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(Number.NaN)).toBe('NaN');
    expect(formatNumber(Number.NEGATIVE_INFINITY)).toBe('−∞');
  });
});

describe('formatUnit and formatQuantity', () => {
  it('writes API units typographically and drops the dimensionless dash', () => {
    expect(formatUnit('N*m*s')).toBe('N·m·s');
    expect(formatUnit('kg/m^2')).toBe('kg/m²');
    expect(formatQuantity(0.25, '-')).toBe('0.250');
    expect(formatQuantity(null, 'm/s')).toBe('—');
  });
});

describe('formatSi', () => {
  it('picks the SI prefix that puts the mantissa in [1, 1000)', () => {
    expect(formatSi(3.2e-6, 'N')).toBe('3.20 µN');
    expect(formatSi(4.52e-4, 'N')).toBe('452 µN');
    expect(formatSi(42_155_900, 'm')).toBe('42.2 Mm');
  });

  it('moves to the next prefix when rounding reaches 1000', () => {
    expect(formatSi(999.96e-6, 'N*m')).toBe('1.00 mN·m');
  });
});

describe('formatPercent', () => {
  it('shows the sign of a margin with one decimal below 100 %', () => {
    expect(formatPercent(12.46)).toBe('+12.5 %');
    expect(formatPercent(-3)).toBe('−3.0 %');
    expect(formatPercent(250.4)).toBe('+250 %');
  });
});
