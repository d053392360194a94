import { describe, expect, it } from 'vitest';
import { fieldErrors } from './errors';
import { initialOrbitSchema } from './orbit';

const geo = {
  kind: 'keplerian',
  epochUtc: '2026-03-20T12:00:00Z',
  centralBody: 'earth',
  frame: 'EQJ',
  semiMajorAxisKm: 42_164.17,
  eccentricity: 0,
  inclinationDeg: 0,
  raanDeg: 0,
  argPeriapsisDeg: 0,
  trueAnomalyDeg: 75,
} as const;

const leo = {
  kind: 'cartesian',
  epochUtc: '2026-03-20T12:00:00.250Z',
  centralBody: 'earth',
  frame: 'EQJ',
  positionKm: [6778, 0, 0],
  velocityKmS: [0, 4.76, 5.99],
} as const;

function errorsOf(value: unknown): Record<string, string> {
  const result = initialOrbitSchema.safeParse(value);
  expect(result.success).toBe(false);
  return result.success ? {} : fieldErrors(result.error);
}

describe('initialOrbitSchema', () => {
  it('accepts a geostationary orbit as Keplerian elements and a LEO state as Cartesian', () => {
    expect(initialOrbitSchema.parse(geo)).toEqual(geo);
    expect(initialOrbitSchema.parse(leo)).toEqual(leo);
  });

  it('accepts a heliocentric sail orbit and a hyperbolic escape', () => {
    expect(initialOrbitSchema.safeParse({ ...geo, centralBody: 'sun', semiMajorAxisKm: 1.2e8, eccentricity: 0.1 }).success).toBe(true);
    expect(initialOrbitSchema.safeParse({ ...geo, semiMajorAxisKm: -20_000, eccentricity: 1.5, trueAnomalyDeg: 60 }).success).toBe(true);
  });

  it.each([
    ['2026-03-20T12:00:00', 'no Z'],
    ['2026-03-20T12:00:00+02:00', 'an offset'],
    ['2026-03-20', 'a date only'],
    ['1969-07-20T20:17:40Z', 'before 1972'],
  ])('refuses epochUtc %s (%s) with a message naming epochUtc', (epochUtc) => {
    const errors = errorsOf({ ...geo, epochUtc });
    expect(Object.keys(errors)).toEqual(['epochUtc']);
    expect(errors.epochUtc).toMatch(/^epochUtc must /);
  });

  it('refuses another frame, naming frame and the EQJ wording', () => {
    const errors = errorsOf({ ...geo, frame: 'EME2000' });
    expect(errors.frame).toContain('EQJ');
    expect(errors.frame).toContain('J2000 equatorial');
  });

  it('refuses a central body other than the Earth or the Sun', () => {
    expect(errorsOf({ ...geo, centralBody: 'moon' }).centralBody).toMatch(/^centralBody must be 'earth' or 'sun'/);
  });

  it('refuses an altitude given as the semi-major axis, naming semiMajorAxisKm', () => {
    const errors = errorsOf({ ...geo, semiMajorAxisKm: 35_786 - 30_000 });
    expect(errors.semiMajorAxisKm).toContain('inside the earth');
  });

  it.each([
    [{ eccentricity: 1 }, 'eccentricity'],
    [{ eccentricity: -0.1 }, 'eccentricity'],
    [{ semiMajorAxisKm: -42_164.17 }, 'semiMajorAxisKm'],
    [{ semiMajorAxisKm: 20_000, eccentricity: 1.5 }, 'semiMajorAxisKm'],
    [{ semiMajorAxisKm: -20_000, eccentricity: 1.5, trueAnomalyDeg: 150 }, 'trueAnomalyDeg'],
    [{ inclinationDeg: 181 }, 'inclinationDeg'],
    [{ raanDeg: 400 }, 'raanDeg'],
    [{ argPeriapsisDeg: Number.NaN }, 'argPeriapsisDeg'],
    [{ trueAnomalyDeg: '75' }, 'trueAnomalyDeg'],
  ])('refuses %o with a message naming %s', (patch, field) => {
    const errors = errorsOf({ ...geo, ...patch });
    expect(errors[field]).toMatch(new RegExp(`^${field} `));
  });

  it.each([
    [{ positionKm: [6778, 0] }, 'positionKm'],
    [{ positionKm: [1000, 0, 0] }, 'positionKm'],
    [{ velocityKmS: [0, 0, Number.POSITIVE_INFINITY] }, 'velocityKmS.2'],
    [{ velocityKmS: [1, 0, 0] }, 'velocityKmS'],
  ])('refuses the Cartesian state %o with a message naming %s', (patch, field) => {
    const errors = errorsOf({ ...leo, ...patch });
    expect(errors[field]).toMatch(new RegExp(`^${field.split('.')[0]} `));
  });

  it('refuses an unknown kind, naming kind', () => {
    expect(errorsOf({ ...geo, kind: 'tle' }).kind).toBeDefined();
  });
});
