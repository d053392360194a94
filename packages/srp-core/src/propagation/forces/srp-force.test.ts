import { describe, expect, it } from 'vitest';
import { createAttitudeLaw } from '../../attitude/attitude-law';
import { createGeocentricEphemeris } from '../../bodies/geocentric-ephemeris';
import type { Vec3 } from '../../math/vec3';
import { earthMoonShadowFraction } from '../../radiation/shadow';
import { parseUtcEpoch } from '../../time/epoch';
import { compileVehicle } from '../../vehicles/compile-vehicle';
import { createSrpInertialResult, evaluateSrpInertial } from '../../vehicles/evaluate-srp';
import type { PlateVehicleSpec } from '../../vehicles/vehicle-spec';
import { AU_M, C, DEG, S0 } from '../../vehicles/vehicle-test-helpers';
import { createSrpDetail, createSrpForce } from './srp-force';

const cannonball = compileVehicle({
  kind: 'cannonball',
  name: 'ball',
  massKg: 500,
  centreOfMassM: [0, 0, 0],
  areaM2: 12,
  cr: 1.3,
});
const identity = createAttitudeLaw({ law: 'inertial', quaternion: [1, 0, 0, 0] });
const epoch = parseUtcEpoch('2026-06-21T00:00:00Z');
const eph = createGeocentricEphemeris(epoch, 0, 2 * 86_400);

describe('createSrpForce', () => {
  it('a cannonball at 1 au from the Sun gets P Cr A / m directed away from the Sun', () => {
    // F = P Cr A along −(Sun direction), P = S0/c at 1 au. Source: Montenbruck & Gill (2000),
    // §3.4.1, eq. 3.75 (equation number from memory). Same arithmetic, different order: 1e-14.
    const force = createSrpForce({
      vehicle: cannonball,
      attitude: identity,
      shadowModel: 'conical',
      centralBody: 'sun',
      ephemeris: null,
    });
    const a: Vec3 = [0, 0, 0];
    const dir = [0.6, 0, 0.8];
    force.acceleration(a, 0, Float64Array.of(AU_M * dir[0]!, 0, AU_M * dir[2]!, 0, 29_780, 0));
    const want = ((S0 / C) * 1.3 * 12) / 500;
    expect(Math.hypot(...a) / want - 1).toBeCloseTo(0, 14);
    expect(a[0] / want).toBeCloseTo(0.6, 14);
    expect(a[2] / want).toBeCloseTo(0.8, 14);
    expect(want).toBeCloseTo(1.416e-7, 9);
  });

  it('scales with the inverse square of the actual Sun distance', () => {
    const force = createSrpForce({ vehicle: cannonball, attitude: identity, shadowModel: 'none', centralBody: 'sun', ephemeris: null });
    const a1: Vec3 = [0, 0, 0];
    const a2: Vec3 = [0, 0, 0];
    force.acceleration(a1, 0, Float64Array.of(AU_M, 0, 0, 0, 0, 0));
    force.acceleration(a2, 0, Float64Array.of(0.5 * AU_M, 0, 0, 0, 0, 0));
    expect(a2[0] / a1[0]).toBeCloseTo(4, 13);
  });

  it('in the Earth umbra the acceleration is zero; on the day side it is P Cr A/m at the real distance', () => {
    const force = createSrpForce({
      vehicle: cannonball,
      attitude: identity,
      shadowModel: 'conical',
      centralBody: 'earth',
      ephemeris: eph,
    });
    const t = 3600;
    const sun: Vec3 = [0, 0, 0];
    eph.sunPositionAt(sun, t);
    const sn = Math.hypot(...sun);
    const r = 7_000_000;
    const a: Vec3 = [1, 1, 1];
    const night = Float64Array.of((-r * sun[0]) / sn, (-r * sun[1]) / sn, (-r * sun[2]) / sn, 0, 0, 0);
    force.acceleration(a, t, night);
    expect(a).toEqual([0, 0, 0]);
    const detail = force.detail(createSrpDetail(), t, night);
    expect(detail.illuminatedFraction).toBe(0);
    const day = Float64Array.of((r * sun[0]) / sn, (r * sun[1]) / sn, (r * sun[2]) / sn, 0, 0, 0);
    force.acceleration(a, t, day);
    const d = sn - r;
    const want = ((S0 / C) * (AU_M / d) ** 2 * 1.3 * 12) / 500;
    expect(Math.hypot(...a) / want - 1).toBeCloseTo(0, 12);
    expect((a[0] * sun[0] + a[1] * sun[1] + a[2] * sun[2]) / sn / want).toBeCloseTo(-1, 12);
  });

  it('in the penumbra it is scaled by the same illuminated fraction as earthMoonShadowFraction', () => {
    const force = createSrpForce({ vehicle: cannonball, attitude: identity, shadowModel: 'conical', centralBody: 'earth', ephemeris: eph });
    const t = 7200;
    const sun: Vec3 = [0, 0, 0];
    const moon: Vec3 = [0, 0, 0];
    eph.sunPositionAt(sun, t);
    eph.moonPositionAt(moon, t);
    const sn = Math.hypot(...sun);
    const u = sun.map((x) => x / sn) as Vec3;
    // A point behind the Earth just at the shadow edge: R⊕ from the axis, 7000 km behind.
    const perp: Vec3 = [u[1], -u[0], 0];
    const pn = Math.hypot(...perp);
    const edge = 6_378_137 + 2_000;
    const y = Float64Array.of(
      -7e6 * u[0] + (edge * perp[0]) / pn,
      -7e6 * u[1] + (edge * perp[1]) / pn,
      -7e6 * u[2],
      0,
      0,
      0,
    );
    const nu = earthMoonShadowFraction('conical', [y[0]!, y[1]!, y[2]!], sun, moon);
    expect(nu).toBeGreaterThan(0);
    expect(nu).toBeLessThan(1);
    const detail = force.detail(createSrpDetail(), t, y);
    expect(detail.illuminatedFraction).toBe(nu);
  });

  it('a plate vehicle under a Sun-pointing law matches evaluateSrpInertial composed by hand', () => {
    const spec: PlateVehicleSpec = {
      kind: 'plates',
      name: 'box-wing',
      massKg: 2000,
      centreOfMassM: [0, 0, 0.2],
      plates: [
        { name: '+x', areaM2: 4, normal: [1, 0, 0], centroidM: [1, 0, 0], front: 'mli-kapton' },
        { name: '+z', areaM2: 3, normal: [0, 0, 1], centroidM: [0, 0, 1], front: 'white-paint' },
        {
          name: 'wing',
          areaM2: 20,
          normal: [1, 0, 0],
          centroidM: [0, 5, 0],
          front: 'solar-cell',
          back: 'solar-array-back',
          trackingAxis: [0, 1, 0],
          trackingLimitsRad: [-170 * DEG, 170 * DEG],
        },
      ],
    };
    const vehicle = compileVehicle(spec);
    const law = createAttitudeLaw({
      law: 'sun-pointing',
      sunAxisBody: [1, 0.2, 0.1],
      secondaryAxisBody: [0, 0, 1],
      secondaryReference: 'orbit-normal',
    });
    const force = createSrpForce({ vehicle, attitude: law, shadowModel: 'conical', centralBody: 'earth', ephemeris: eph });
    const t = 12_345;
    const y = Float64Array.of(30e6, 28e6, 1e6, -2200, 2300, 100);
    const detail = force.detail(createSrpDetail(), t, y);
    const sun: Vec3 = [0, 0, 0];
    eph.sunPositionAt(sun, t);
    const d = Math.hypot(sun[0] - y[0]!, sun[1] - y[1]!, sun[2] - y[2]!);
    const sunDir: Vec3 = [(sun[0] - y[0]!) / d, (sun[1] - y[1]!) / d, (sun[2] - y[2]!) / d];
    const ref = createSrpInertialResult(vehicle);
    evaluateSrpInertial(ref, vehicle, detail.attitude, sunDir, (S0 / C) * (AU_M / d) ** 2, 1);
    // Same operations in a different order (pressure folded as P·AU²/d²): 1e-13 relative.
    const scale = Math.hypot(...ref.forceInertial) / 2000;
    for (let k = 0; k < 3; k += 1) {
      expect(Math.abs(detail.accelInertial[k]! - ref.forceInertial[k]! / 2000)).toBeLessThan(1e-13 * scale);
      expect(Math.abs(detail.accelBody[k]! - ref.body.forceBody[k]! / 2000)).toBeLessThan(1e-13 * scale);
      const torqueScale = Math.hypot(...ref.body.torqueBody);
      expect(Math.abs(detail.torqueBody[k]! - ref.body.torqueBody[k]!)).toBeLessThan(1e-13 * torqueScale);
    }
    expect(detail.sunDistanceM / d - 1).toBeCloseTo(0, 15); // hypot vs sqrt of the sum: rounding
    expect(detail.illuminatedFraction).toBe(1);
    const a: Vec3 = [0, 0, 0];
    force.acceleration(a, t, y);
    expect(a).toEqual(detail.accelInertial);
  });

  it("refuses an Earth-centred force without an ephemeris, naming ephemeris", () => {
    expect(() =>
      createSrpForce({ vehicle: cannonball, attitude: identity, shadowModel: 'conical', centralBody: 'earth', ephemeris: null }),
    ).toThrow(expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'ephemeris' }) }));
  });

  it('refuses an unknown shadow body, naming shadowBodies.<i>', () => {
    expect(() =>
      createSrpForce({
        vehicle: cannonball,
        attitude: identity,
        shadowModel: 'conical',
        centralBody: 'earth',
        ephemeris: eph,
        shadowBodies: ['earth', 'mars' as 'moon'],
      }),
    ).toThrow(expect.objectContaining({ details: expect.objectContaining({ field: 'shadowBodies.1' }) }));
  });
});
