import { describe, expect, it } from 'vitest';
import { compileVehicle } from './compile-vehicle';
import type { PlateSpec, PlateVehicleSpec, VehicleSpec } from './vehicle-spec';
import { DEG, srpErrorFor } from './vehicle-test-helpers';

function plate(name: string, extra: Partial<PlateSpec> = {}): PlateSpec {
  return { name, areaM2: 1, normal: [0, 0, 1], centroidM: [0, 0, 0], front: 'white-paint', ...extra };
}

/** Four good plates with `bad` in position 3, so the path must say `plates.3`. */
function withPlate3(bad: Partial<PlateSpec>): PlateVehicleSpec {
  return {
    kind: 'plates',
    name: 'v',
    massKg: 10,
    centreOfMassM: [0, 0, 0],
    plates: [plate('a'), plate('b'), plate('c'), plate('d', bad)],
  };
}

describe('compileVehicle refuses bad specs with an SrpError naming the field', () => {
  const cases: [string, unknown, string, string][] = [
    ['a negative specular fraction', withPlate3({ front: { absorbed: 0.6, specular: -0.1, diffuse: 0.5 } }), 'out_of_range', 'plates.3.front.specular'],
    ['fractions summing to 1.1', withPlate3({ back: { absorbed: 0.5, specular: 0.4, diffuse: 0.2 } }), 'optics_sum', 'plates.3.back'],
    ['an unknown material preset', withPlate3({ back: 'gold-foil' as PlateSpec['back'] }), 'invalid_input', 'plates.3.back'],
    ['emissivityFront without emissivityBack', withPlate3({ front: { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.8 } }), 'invalid_input', 'plates.3.front.emissivityBack'],
    [
      'two sides disagreeing about the back face’s emissivity',
      withPlate3({
        front: { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.8, emissivityBack: 0.5 },
        back: { absorbed: 1, specular: 0, diffuse: 0, emissivityFront: 0.6, emissivityBack: 0.8 },
      }),
      'invalid_input',
      'plates.3.back.emissivityFront',
    ],
    ['a zero area', withPlate3({ areaM2: 0 }), 'out_of_range', 'plates.3.areaM2'],
    ['a zero normal', withPlate3({ normal: [0, 0, 0] }), 'invalid_input', 'plates.3.normal'],
    ['a NaN centroid component', withPlate3({ centroidM: [0, Number.NaN, 0] }), 'invalid_input', 'plates.3.centroidM.1'],
    ['a duplicate plate name', withPlate3({ name: 'b' }), 'invalid_input', 'plates.3.name'],
    ['an empty plate name', withPlate3({ name: ' ' }), 'invalid_input', 'plates.3.name'],
    ['drive limits without a drive axis', withPlate3({ trackingLimitsRad: [-1, 1] }), 'invalid_input', 'plates.3.trackingLimitsRad'],
    ['a drive axis along the normal', withPlate3({ trackingAxis: [0, 0, 2] }), 'invalid_input', 'plates.3.trackingAxis'],
    ['a zero drive axis', withPlate3({ trackingAxis: [0, 0, 0] }), 'invalid_input', 'plates.3.trackingAxis'],
    ['drive limits in the wrong order', withPlate3({ trackingAxis: [0, 1, 0], trackingLimitsRad: [1, -1] }), 'out_of_range', 'plates.3.trackingLimitsRad'],
    ['a drive limit beyond 2π', withPlate3({ trackingAxis: [0, 1, 0], trackingLimitsRad: [0, 400 * DEG] }), 'out_of_range', 'plates.3.trackingLimitsRad.1'],
    ['drive limits spanning more than one turn', withPlate3({ trackingAxis: [0, 1, 0], trackingLimitsRad: [-200 * DEG, 200 * DEG] }), 'out_of_range', 'plates.3.trackingLimitsRad'],
    ['no plates', { kind: 'plates', name: 'v', massKg: 1, centreOfMassM: [0, 0, 0], plates: [] }, 'invalid_input', 'plates'],
    ['a zero mass', { ...withPlate3({}), massKg: 0 }, 'out_of_range', 'massKg'],
    ['a missing centre of mass', { ...withPlate3({}), centreOfMassM: undefined }, 'invalid_input', 'centreOfMassM'],
    ['an empty name', { ...withPlate3({}), name: '' }, 'invalid_input', 'name'],
    ['an unknown kind', { kind: 'hull', name: 'm', massKg: 1, centreOfMassM: [0, 0, 0] }, 'invalid_input', 'kind'],
    ['a cannonball Cr above 2', { kind: 'cannonball', name: 'b', massKg: 1, centreOfMassM: [0, 0, 0], areaM2: 1, cr: 2.5 }, 'out_of_range', 'cr'],
    ['a cannonball with a negative area', { kind: 'cannonball', name: 'b', massKg: 1, centreOfMassM: [0, 0, 0], areaM2: -1, cr: 1 }, 'out_of_range', 'areaM2'],
  ];
  for (const [situation, spec, code, field] of cases) {
    it(`${situation}: ${code} naming ${field}`, () => {
      expect(() => compileVehicle(spec as VehicleSpec)).toThrow(srpErrorFor(code, field));
    });
  }

  it('says in the message what would be right', () => {
    expect(() => compileVehicle(withPlate3({ trackingAxis: [0, 0, 1] }))).toThrow(/plates\.3\.trackingAxis.*plane of the plate/);
  });
});

describe('compileVehicle packs a good spec', () => {
  it('normalises normals and takes lever arms from the centre of mass', () => {
    const v = compileVehicle({
      kind: 'plates',
      name: 'v',
      massKg: 10,
      centreOfMassM: [0.5, 0, -1],
      plates: [plate('a', { normal: [0, 3, 4], centroidM: [1, 2, 3] })],
    });
    expect(Array.from(v.normal)).toEqual([0, 0.6, 0.8]);
    expect(Array.from(v.leverArmM)).toEqual([0.5, 2, 4]);
    expect(v.surfaceNames).toEqual(['a']);
    expect(v.surfaceCount).toBe(1);
  });

  it('gives a sail one surface whose lit front faces against the sail normal', () => {
    const v = compileVehicle({
      kind: 'sail',
      name: 's',
      massKg: 10,
      centreOfMassM: [0, 0, 0],
      areaM2: 100,
      normal: [0, 0, 2],
      centroidM: [0, 0, 0.1],
      optics: 'ideal',
    });
    expect(v.surfaceNames).toEqual(['sail']);
    expect(Array.from(v.sailNormal)).toEqual([0, 0, 1]);
    expect(Array.from(v.normal)).toEqual([-0, -0, -1]);
    expect(v.sailAreaM2).toBe(100);
  });

  it('accepts drive limits of exactly ±360° converted to radians', () => {
    const spec = withPlate3({ trackingAxis: [0, 1, 0], trackingLimitsRad: [(-360 * Math.PI) / 180, 0] });
    expect(compileVehicle(spec).tracks[3]).toBe(1);
  });
});
