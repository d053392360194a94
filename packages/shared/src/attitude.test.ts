import { describe, expect, it } from 'vitest';
import { attitudeLawSchema } from './attitude';
import { fieldErrors } from './errors';

/** Field → message map of a refused input (the form the API answers with). */
function errorsOf(input: unknown): Record<string, string> {
  const result = attitudeLawSchema.safeParse(input);
  expect(result.success).toBe(false);
  return result.success ? {} : fieldErrors(result.error);
}

describe('attitudeLawSchema', () => {
  it('accepts one valid example of every law', () => {
    const examples = [
      { law: 'inertial', quaternion: [0.7071068, 0, 0, 0.7071068] },
      { law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], secondaryReference: 'orbit-normal' },
      { law: 'lvlh' },
      { law: 'lvlh', offsetQuaternion: [1, 0, 0, 0] },
      { law: 'sail-cone-clock', coneDeg: 35.26, clockDeg: 90, normalAxisBody: [0, 0, -1] },
      { law: 'tabulated', profileId: '4d7c1c7e-8a55-4f0e-9d5c-2b1f4f1d9a10' },
      { law: 'tabulated', rows: [{ tS: 0, quaternion: [1, 0, 0, 0] }, { tS: 60, quaternion: [0, 1, 0, 0] }], outside: 'clamp' },
    ];
    for (const example of examples) expect(attitudeLawSchema.parse(example)).toEqual(example);
  });

  it('an unknown law is refused with a message listing the laws', () => {
    expect(errorsOf({ law: 'spin' }).law).toMatch(/law must be one of inertial, sun-pointing, lvlh, sail-cone-clock, tabulated/);
  });

  it('a quaternion off unit norm or of 3 numbers is refused naming the field', () => {
    expect(errorsOf({ law: 'inertial', quaternion: [1, 0.1, 0, 0] }).quaternion).toMatch(/quaternion must be a unit quaternion/);
    expect(errorsOf({ law: 'inertial', quaternion: [1, 0, 0] }).quaternion).toMatch(/quaternion must be a quaternion \[w, x, y, z\]/);
    expect(errorsOf({ law: 'lvlh', offsetQuaternion: [2, 0, 0, 0] }).offsetQuaternion).toMatch(/offsetQuaternion must be a unit/);
  });

  it('a zero axis, parallel axes and an unknown reference are refused naming the field', () => {
    const base = { law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [1, 0, 0], secondaryReference: 'nadir' };
    expect(errorsOf({ ...base, sunAxisBody: [0, 0, 0] }).sunAxisBody).toMatch(/sunAxisBody must not be the zero vector/);
    expect(errorsOf({ ...base, secondaryAxisBody: [0, 0, -3] }).secondaryAxisBody).toMatch(/must not be parallel to sunAxisBody/);
    expect(errorsOf({ ...base, secondaryReference: 'zenith' }).secondaryReference).toMatch(/secondaryReference must be one of/);
  });

  it('a cone above 90° or a clock beyond ±360° is refused naming the field in degrees', () => {
    const base = { law: 'sail-cone-clock', coneDeg: 30, clockDeg: 0, normalAxisBody: [0, 0, 1] };
    expect(errorsOf({ ...base, coneDeg: 91 }).coneDeg).toMatch(/coneDeg must be between 0 and 90 degrees/);
    expect(errorsOf({ ...base, coneDeg: -1 }).coneDeg).toMatch(/coneDeg must be between 0 and 90 degrees/);
    expect(errorsOf({ ...base, clockDeg: 400 }).clockDeg).toMatch(/clockDeg must be between -360 and 360 degrees/);
    expect(errorsOf({ ...base, coneDeg: '30' }).coneDeg).toMatch(/coneDeg must be a number of degrees/);
  });

  it('a tabulated law needs exactly one of profileId and rows, and rows with strictly increasing tS', () => {
    expect(errorsOf({ law: 'tabulated' }).profileId).toMatch(/either profileId or rows/);
    const rows = [
      { tS: 0, quaternion: [1, 0, 0, 0] },
      { tS: 60, quaternion: [1, 0, 0, 0] },
      { tS: 60, quaternion: [1, 0, 0, 0] },
    ];
    expect(errorsOf({ law: 'tabulated', rows })['rows.2.tS']).toMatch(/rows.2.tS must be greater than rows.1.tS/);
    expect(errorsOf({ law: 'tabulated', rows: rows.slice(0, 1) }).rows).toMatch(/at least 2 rows/);
    expect(errorsOf({ law: 'tabulated', profileId: 'abc' }).profileId).toMatch(/profileId must be a UUID/);
  });
});
