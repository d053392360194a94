import { describe, expect, it } from 'vitest';
import { formatValue, isOpticalFraction, lineUnit, pathUnit } from './study-format';

describe('study formatting', () => {
  it('reads the unit from the field name, skipping indices', () => {
    expect(pathUnit('vehicle.areaM2')).toBe('m²');
    expect(pathUnit('vehicle.massKg')).toBe('kg');
    expect(pathUnit('vehicle.centreOfMassM.0')).toBe('m');
    expect(pathUnit('scenario.attitude.coneDeg')).toBe('deg');
    expect(pathUnit('vehicle.plates.3.front.specular')).toBe('–');
  });

  it('knows the optical fractions and writes line units for display', () => {
    expect(isOpticalFraction('vehicle.plates.0.front.diffuse')).toBe(true);
    expect(isOpticalFraction('vehicle.massKg')).toBe(false);
    expect(lineUnit('momentum.peak')).toBe('N·m·s');
    expect(lineUnit('srp.accel.mean')).toBe('m/s²');
  });

  it('gives four significant figures, exponent form for very small values', () => {
    expect(formatValue(0.123456)).toBe('0.1235');
    expect(formatValue(1.4537e-4)).toBe('1.454e-4');
    expect(formatValue(null)).toBe('—');
  });
});
