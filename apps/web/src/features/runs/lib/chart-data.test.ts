import { describe, expect, it } from 'vitest';
import { alignColumns, chooseDisplayUnit, unwrapDegrees } from './chart-data';

describe('alignColumns', () => {
  it('puts columns with their own times on the union of times, null where a column has no point', () => {
    const aligned = alignColumns(
      [
        { t: [0, 60, 120], values: [1, 2, 3] },
        { t: [0, 90], values: [10, 20] },
      ],
      { scale: 2, xScale: 1 / 60 },
    );
    expect(aligned).toEqual([
      [0, 1, 1.5, 2],
      [2, 4, null, 6],
      [20, null, 40, null],
    ]);
  });
});

describe('chooseDisplayUnit', () => {
  it('shows accelerations near 1e-7 m/s² in nm/s² and metres in km', () => {
    expect(chooseDisplayUnit('m/s^2', 1.09e-7)).toEqual({ factor: 1e9, label: 'nm/s²' });
    expect(chooseDisplayUnit('m', 4.2e7)).toEqual({ factor: 1e-3, label: 'km' });
  });

  it('scales a small dimensionless value by a power of ten', () => {
    expect(chooseDisplayUnit('-', 2.4e-4)).toEqual({ factor: 1e4, label: '×10⁻⁴' });
  });
});

describe('unwrapDegrees', () => {
  it('takes each step the short way round so 359° → 1° is a 2° step', () => {
    expect(unwrapDegrees([358, 359, 1, 2, 359])).toEqual([358, 359, 361, 362, 359]);
  });
});
