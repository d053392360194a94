import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fieldErrors } from './errors';
import { vehicleSpecSchema } from './vehicle';

/** A fixture file, read as data (the shared package cannot import the fixtures package). */
function fixture(name: string): unknown {
  return JSON.parse(readFileSync(new URL(`../../../fixtures/vehicles/${name}`, import.meta.url), 'utf8'));
}

/** The field → message map the API would answer with, for `value`. */
function errorsFor(value: unknown): Record<string, string> {
  const result = vehicleSpecSchema.safeParse(value);
  if (result.success) throw new Error('expected the vehicle to be refused');
  return fieldErrors(result.error);
}

const goodPlates = () => ({
  kind: 'plates',
  name: 'Box',
  massKg: 100,
  centreOfMassM: [0, 0, 0],
  plates: [
    { name: 'a', areaM2: 1, normal: [0, 0, 1], centroidM: [0, 0, 0.5], front: 'mli-kapton' },
    {
      name: 'wing',
      areaM2: 4,
      normal: [1, 0, 0],
      centroidM: [0, 3, 0],
      front: { absorbed: 0.8, specular: 0.1, diffuse: 0.1, emissivityFront: 0.85, emissivityBack: 0.8 },
      back: 'solar-array-back',
      trackingAxis: [0, 1, 0],
      trackingLimitsDeg: [-90, 90],
    },
  ],
});

describe('vehicleSpecSchema accepts the demo vehicles', () => {
  it('fixtures/vehicles/corvina-2.vehicle.json parses as a 10-plate box-wing with two tracking wings', () => {
    const v = vehicleSpecSchema.parse(fixture('corvina-2.vehicle.json'));
    expect(v.kind).toBe('plates');
    if (v.kind !== 'plates') return;
    expect(v.plates).toHaveLength(10);
    expect(v.plates.filter((p) => p.trackingAxis !== undefined)).toHaveLength(2);
  });

  it('fixtures/vehicles/halyard-1.vehicle.json parses as a sail with the square-sail coefficients', () => {
    const v = vehicleSpecSchema.parse(fixture('halyard-1.vehicle.json'));
    expect(v).toMatchObject({ kind: 'sail', areaM2: 196, optics: 'mcinnes-square-sail' });
  });

  it('accepts a cannonball and a sail with explicit coefficients', () => {
    expect(vehicleSpecSchema.safeParse({ kind: 'cannonball', name: 'b', massKg: 1, centreOfMassM: [0, 0, 0], areaM2: 1, cr: 1.3 }).success).toBe(true);
    const optics = { r: 0.9, s: 0.9, emissivityFront: 0.05, emissivityBack: 0.6, nonLambertianFront: 0.8, nonLambertianBack: 0.6 };
    const sail = { kind: 'sail', name: 's', massKg: 5, centreOfMassM: [0, 0, 0], areaM2: 50, normal: [0, 0, 1], centroidM: [0, 0, 0], optics };
    expect(vehicleSpecSchema.safeParse(sail).success).toBe(true);
  });
});

describe('vehicleSpecSchema refuses bad vehicles, naming the field', () => {
  it('optics that do not sum to 1, at the optics object', () => {
    const v = goodPlates();
    v.plates[0]!.front = { absorbed: 0.5, specular: 0.4, diffuse: 0.2 } as never;
    expect(errorsFor(v)).toEqual({ 'plates.0.front': expect.stringMatching(/must equal 1/) });
  });

  it('optics sums within 1e-9 of 1 pass (decimal rounding)', () => {
    const v = goodPlates();
    v.plates[0]!.front = { absorbed: 0.7, specular: 0.2, diffuse: 0.1 } as never; // sums to 0.9999999999999999
    expect(vehicleSpecSchema.safeParse(v).success).toBe(true);
  });

  it('a negative fraction, at the fraction', () => {
    const v = goodPlates();
    v.plates[0]!.front = { absorbed: 0.6, specular: -0.1, diffuse: 0.5 } as never;
    expect(errorsFor(v)['plates.0.front.specular']).toBe('specular must be at least 0');
  });

  it('one emissivity without the other, at the missing one', () => {
    const v = goodPlates();
    v.plates[0]!.front = { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.8 } as never;
    expect(errorsFor(v)['plates.0.front.emissivityBack']).toMatch(/required/);
  });

  it('an unknown material preset, listing the presets', () => {
    const v = goodPlates();
    v.plates[1]!.back = 'gold-foil';
    expect(errorsFor(v)['plates.1.back']).toMatch(/solar-cell, solar-array-back/);
  });

  it('a zero normal', () => {
    const v = goodPlates();
    v.plates[0]!.normal = [0, 0, 0];
    expect(errorsFor(v)).toEqual({ 'plates.0.normal': 'normal must not be the zero vector' });
  });

  it('drive limits in the wrong order', () => {
    const v = goodPlates();
    v.plates[1]!.trackingLimitsDeg = [90, -90];
    expect(errorsFor(v)['plates.1.trackingLimitsDeg']).toMatch(/min ≤ max/);
  });

  it('drive limits spanning more than a turn', () => {
    const v = goodPlates();
    v.plates[1]!.trackingLimitsDeg = [-270, 270];
    expect(errorsFor(v)['plates.1.trackingLimitsDeg']).toMatch(/at most 360/);
  });

  it('drive limits without a drive axis', () => {
    const v = goodPlates();
    delete (v.plates[1] as { trackingAxis?: unknown }).trackingAxis;
    expect(errorsFor(v)['plates.1.trackingLimitsDeg']).toMatch(/needs trackingAxis/);
  });

  it('a drive axis along the plate normal', () => {
    const v = goodPlates();
    v.plates[1]!.trackingAxis = [2, 0, 0];
    expect(errorsFor(v)['plates.1.trackingAxis']).toMatch(/parallel to normal/);
  });

  it('two plates with the same name, at the second', () => {
    const v = goodPlates();
    v.plates[1]!.name = 'a';
    expect(errorsFor(v)['plates.1.name']).toMatch(/already used by plates\.0/);
  });

  it('a misspelt key, naming it and listing the allowed keys', () => {
    const v = goodPlates();
    (v.plates[0] as Record<string, unknown>).areaM = 2;
    expect(errorsFor(v)['plates.0']).toMatch(/unknown key\(s\) areaM; allowed: name, areaM2/);
  });

  it('a missing mass', () => {
    const v: Record<string, unknown> = goodPlates();
    delete v.massKg;
    expect(errorsFor(v)).toEqual({ massKg: 'massKg must be a finite number (kg)' });
  });

  it('an unknown kind', () => {
    expect(errorsFor({ kind: 'wireframe', name: 'm' })).toEqual({ kind: 'kind must be one of cannonball, plates, sail, mesh' });
  });

  it('a cannonball Cr above 2', () => {
    expect(errorsFor({ kind: 'cannonball', name: 'b', massKg: 1, centreOfMassM: [0, 0, 0], areaM2: 1, cr: 2.2 })).toEqual({
      cr: 'cr must be at most 2 (a mirror facing the Sun)',
    });
  });

  it('a sail reflectivity above 1 and an unknown sail preset', () => {
    const sail = { kind: 'sail', name: 's', massKg: 5, centreOfMassM: [0, 0, 0], areaM2: 50, normal: [0, 0, 1], centroidM: [0, 0, 0] };
    const optics = { r: 1.2, s: 0.9, emissivityFront: 0.05, emissivityBack: 0.6, nonLambertianFront: 0.8, nonLambertianBack: 0.6 };
    expect(errorsFor({ ...sail, optics })['optics.r']).toBe('r must be at most 1');
    expect(errorsFor({ ...sail, optics: 'heliogyro' })['optics']).toMatch(/'ideal', one of mcinnes-square-sail/);
  });
});

describe('vehicleSpecSchema, mesh vehicles', () => {
  const goodMesh = () => ({
    kind: 'mesh',
    name: 'Bus mesh',
    massKg: 900,
    centreOfMassM: [0, 0, 0],
    meshId: '7b3f1d2e-4c5a-4e6f-8a9b-0c1d2e3f4a5b',
    optics: { default: { front: 'mli-kapton' }, groups: { wing: { front: 'solar-cell', back: 'solar-array-back' } } },
  });

  it('fills the table settings with their defaults (5°, 4 samples, no bounce)', () => {
    const v = vehicleSpecSchema.parse(goodMesh());
    expect(v.kind === 'mesh' && v.table).toEqual({ stepDeg: 5, samplesPerFacet: 4, specularBounce: false });
  });

  it('refuses a grid step that does not divide 180 and a sample count that is not a square, naming the field', () => {
    const errors = errorsFor({ ...goodMesh(), table: { stepDeg: 7, samplesPerFacet: 5 } });
    expect(errors['table.stepDeg']).toMatch(/stepDeg must be one of 1, 2, 3, 4, 5, 6, 9, 10, 12, 15/);
    expect(errors['table.samplesPerFacet']).toMatch(/samplesPerFacet must be one of 1, 4, 9/);
  });

  it('refuses group optics that do not add up and a mesh id that is not a UUID', () => {
    const errors = errorsFor({
      ...goodMesh(),
      meshId: 'bus.obj',
      optics: { default: { front: { absorbed: 0.5, specular: 0.2, diffuse: 0.2 } } },
    });
    expect(errors.meshId).toMatch(/UUID/);
    expect(errors['optics.default.front']).toMatch(/must equal 1/);
  });
});
