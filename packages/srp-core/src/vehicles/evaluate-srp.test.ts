import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { createQuat, multiplyQuat, quatFromAxisAngle } from '../attitude/quaternion';
import type { Vec3 } from '../math/vec3';
import { radiationPressureAt } from '../radiation/flux';
import { compileVehicle } from './compile-vehicle';
import {
  centreOfPressureBody,
  createSrpInertialResult,
  createSrpResult,
  evaluateSrp,
  evaluateSrpInertial,
} from './evaluate-srp';
import type { SurfaceOptics } from './surface-optics';
import type { PlateSpec, PlateVehicleSpec } from './vehicle-spec';
import { AU_M, C, DEG, P_1AU, cross, dot, expectVecClose, inXz, norm, srpErrorFor } from './vehicle-test-helpers';

// A few double-precision operations per component, each rounding by at most 1.1e-16 relative:
// 1e-12 of the force magnitude leaves wide margin yet catches any wrong factor, sign or direction.
const REL_TOL = 1e-12;

const ABSORBER: SurfaceOptics = { absorbed: 1, specular: 0, diffuse: 0 };
const MIRROR: SurfaceOptics = { absorbed: 0, specular: 1, diffuse: 0 };

function onePlate(plate: Partial<PlateSpec> & Pick<PlateSpec, 'front'>, com: Vec3 = [0, 0, 0]): PlateVehicleSpec {
  return {
    kind: 'plates',
    name: 'test plate',
    massKg: 100,
    centreOfMassM: com,
    plates: [{ name: 'p', areaM2: 2, normal: [0, 0, 1], centroidM: [0, 0, 0], ...plate }],
  };
}

function forceOf(spec: PlateVehicleSpec, sunDirBody: Vec3, pressurePa = P_1AU): Vec3 {
  const vehicle = compileVehicle(spec);
  return [...evaluateSrp(createSrpResult(vehicle), vehicle, sunDirBody, pressurePa, 1).forceBody] as Vec3;
}

/**
 * The flat-plate force written out by hand from Montenbruck & Gill, Satellite Orbits (2000),
 * §3.4, with Lambertian diffuse reflection:
 * F = -P A cos θ [(1 - ρs) s + 2 (ρs cos θ + ρd/3) m], m the outward normal of the lit face.
 */
function handPlateForce(optics: SurfaceOptics, areaM2: number, s: Vec3, m: Vec3, p = P_1AU): Vec3 {
  const cos = dot(s, m);
  const alongSun = -p * areaM2 * cos * (1 - optics.specular);
  const alongNormal = -p * areaM2 * cos * 2 * (optics.specular * cos + optics.diffuse / 3);
  return [0, 1, 2].map((k) => alongSun * s[k]! + alongNormal * m[k]!) as Vec3;
}

describe('evaluateSrp on a two-sided flat plate', () => {
  const front: SurfaceOptics = { absorbed: 0.5, specular: 0.3, diffuse: 0.2 };
  const back: SurfaceOptics = { absorbed: 0.8, specular: 0.05, diffuse: 0.15 };
  const spec = onePlate({ front, back });

  for (const deg of [0, 30, 60, 85]) {
    it(`with the Sun ${deg}° off the front normal, the front optics give the Montenbruck & Gill force`, () => {
      // source: Montenbruck & Gill, Satellite Orbits (2000), §3.4, written out in handPlateForce
      const s = inXz(deg * DEG);
      expectVecClose(forceOf(spec, s), handPlateForce(front, 2, s, [0, 0, 1]), REL_TOL);
    });

    it(`with the Sun ${deg}° off the back normal, the back optics give the same law about -n`, () => {
      // source: as above, with m = -n and the back's fractions
      const s = inXz(Math.PI - deg * DEG);
      expectVecClose(forceOf(spec, s), handPlateForce(back, 2, s, [0, 0, -1]), REL_TOL);
    });
  }

  it('a one-sided plate lit from behind feels no force', () => {
    expect(forceOf(onePlate({ front }), inXz(120 * DEG))).toEqual([0, 0, 0]);
  });
});

describe('evaluateSrp limits and momentum balance', () => {
  it('a fully absorbing plate facing the Sun gets P·A along the light', () => {
    // source: momentum flux S/c = P through area A, all absorbed (Montenbruck & Gill 2000, §3.4)
    expectVecClose(forceOf(onePlate({ front: ABSORBER }), [0, 0, 1]), [0, 0, -P_1AU * 2], REL_TOL);
  });

  it('a perfect mirror facing the Sun gets 2P·A, twice the absorber', () => {
    // source: specular reflection reverses the incident momentum (Montenbruck & Gill 2000, §3.4)
    expectVecClose(forceOf(onePlate({ front: MIRROR }), [0, 0, 1]), [0, 0, -2 * P_1AU * 2], REL_TOL);
  });

  it('a fully absorbed 10 mW beam pushes with its power over c, 3.3356e-11 N', () => {
    // source: common practice, F = W / c = 0.010 W / 299 792 458 m/s = 3.33564e-11 N
    const areaM2 = 1e-4; // 1 cm² in a 100 W/m² beam carries 10 mW
    const irradiance = 100;
    const f = forceOf(onePlate({ front: ABSORBER, areaM2 }), [0, 0, 1], irradiance / C);
    expect(Math.abs(norm(f) - 0.01 / C) / (0.01 / C)).toBeLessThan(REL_TOL);
    // 5 significant figures as quoted: the quoted value itself is rounded to 5e-5 relative
    expect(Math.abs(norm(f) - 3.3356e-11) / 3.3356e-11).toBeLessThan(5e-5);
  });

  it('half the solar disc visible gives half the force', () => {
    const vehicle = compileVehicle(onePlate({ front: MIRROR }));
    const full = evaluateSrp(createSrpResult(vehicle), vehicle, inXz(0.3), P_1AU, 1).forceBody[2];
    const half = evaluateSrp(createSrpResult(vehicle), vehicle, inXz(0.3), P_1AU, 0.5).forceBody[2];
    expect(Math.abs(half - full / 2)).toBeLessThanOrEqual(REL_TOL * Math.abs(full));
  });
});

describe('a partly reflecting plate (70 % absorbed, 20 % specular, 10 % diffuse) at 45°', () => {
  const optics: SurfaceOptics = { absorbed: 0.7, specular: 0.2, diffuse: 0.1 };
  const s = inXz(45 * DEG);
  const f = forceOf(onePlate({ front: optics, areaM2: 1 }), s);
  const pa = P_1AU;
  const cos = Math.SQRT1_2;
  // By hand from the flat-plate law (Montenbruck & Gill 2000, §3.4): the component along the
  // inward normal is P A cos θ [(1 - ρs) cos θ + 2 ρs cos θ + 2 ρd / 3] = 0.647135 P A.
  const trueNormal = pa * cos * ((1 - 0.2) * cos + 2 * 0.2 * cos + (2 * 0.1) / 3);
  // The Sun-line-only shortcut keeps the incident-momentum term P A cos θ (1 - ρs) along -s and
  // drops the reflected momentum along the normal: its normal component is 0.4 P A.
  const shortcut = pa * cos * (1 - 0.2);
  const shortcutNormal = shortcut * cos;

  it('pushes off the Sun line, by 13.3°', () => {
    // by hand: along -s 0.8 cos θ + (0.34951 cos θ) cos θ; across s 0.34951 cos θ sin θ
    const angle = Math.acos(Math.min(1, -dot(f, s) / norm(f))); // clamp: rounding can exceed 1
    expect(angle / DEG).toBeCloseTo(13.3, 1); // 0.05° resolution is ample to tell it from 0
  });

  it('has a normal component 38 % (about a third) larger than the Sun-line shortcut gives', () => {
    expect(Math.abs(-f[2] - trueNormal)).toBeLessThanOrEqual(REL_TOL * trueNormal);
    const missed = (trueNormal - shortcutNormal) / trueNormal;
    expect(missed).toBeCloseTo(0.3819, 4); // 1 - 0.4 / 0.647135, by hand
  });

  it('and the same in-plane component as the shortcut (only the normal part is missed)', () => {
    expect(Math.abs(-f[0] - shortcut * Math.SQRT1_2)).toBeLessThanOrEqual(REL_TOL * norm(f));
  });
});

describe('evaluateSrp for a cannonball', () => {
  it('pushes P Cr A straight away from the Sun with no torque', () => {
    // source: Montenbruck & Gill, Satellite Orbits (2000), §3.4.1 (cannonball model)
    const vehicle = compileVehicle({
      kind: 'cannonball',
      name: 'ball',
      massKg: 500,
      centreOfMassM: [0.1, 0.2, 0.3],
      areaM2: 4,
      cr: 1.3,
    });
    const s: Vec3 = [0.6, 0, 0.8];
    const result = evaluateSrp(createSrpResult(vehicle, { perSurface: true }), vehicle, s, P_1AU, 1);
    const k = -P_1AU * 1.3 * 4;
    expectVecClose(result.forceBody, [k * 0.6, 0, k * 0.8], REL_TOL);
    expect(result.torqueBody).toEqual([0, 0, 0]);
    expect(Array.from(result.surfacesBody)).toEqual([...result.forceBody, 0, 0, 0]);
    expect(centreOfPressureBody([0, 0, 0], result, vehicle)).toEqual([0.1, 0.2, 0.3]);
  });
});

/** A 2.4 × 2.2 × 3.0 m box of one-sided plates centred at the origin, plus two tracking wings. */
function boxWing(withWings: boolean): PlateVehicleSpec {
  const face = (name: string, normal: Vec3, areaM2: number, half: number, front: PlateSpec['front']): PlateSpec => ({
    name,
    areaM2,
    normal,
    centroidM: normal.map((c) => c * half) as Vec3,
    front,
  });
  const plates: PlateSpec[] = [
    face('+x', [1, 0, 0], 6.6, 1.2, 'mli-kapton'),
    face('-x', [-1, 0, 0], 6.6, 1.2, { absorbed: 0.3, specular: 0.5, diffuse: 0.2 }),
    face('+y', [0, 1, 0], 7.2, 1.1, 'osr-radiator'),
    face('-y', [0, -1, 0], 7.2, 1.1, 'osr-radiator'),
    face('+z', [0, 0, 1], 5.28, 1.5, 'white-paint'),
    face('-z', [0, 0, -1], 5.28, 1.5, 'black-paint'),
  ];
  if (withWings) {
    plates.push(
      { name: 'wing+', areaM2: 35, normal: [1, 0, 0], centroidM: [0, 9, 0], front: 'solar-cell', back: 'solar-array-back', trackingAxis: [0, 1, 0] },
      {
        name: 'wing-',
        areaM2: 35,
        normal: [1, 0, 0],
        centroidM: [0, -9, 0],
        front: 'solar-cell',
        back: 'solar-array-back',
        trackingAxis: [0, -1, 0],
        trackingLimitsRad: [-60 * DEG, 60 * DEG],
      },
    );
  }
  return { kind: 'plates', name: 'box', massKg: 4200, centreOfMassM: [0.05, -0.02, 0.1], plates };
}

/** Unit directions spread over the sphere (Fibonacci lattice). */
function directions(count: number): Vec3[] {
  const out: Vec3[] = [];
  for (let i = 0; i < count; i += 1) {
    const z = 1 - (2 * (i + 0.5)) / count;
    const r = Math.sqrt(1 - z * z);
    out.push([r * Math.cos(2.399963 * i), r * Math.sin(2.399963 * i), z]);
  }
  return out;
}

describe('evaluateSrp on a convex box', () => {
  it('from any direction, only the faces the Sun sees push, and they push away from the Sun', () => {
    const spec = boxWing(false);
    const vehicle = compileVehicle(spec);
    const result = createSrpResult(vehicle, { perSurface: true });
    for (const s of directions(200)) {
      evaluateSrp(result, vehicle, s, P_1AU, 1);
      let lit = 0;
      spec.plates.forEach((plate, i) => {
        const f = result.surfacesBody.subarray(6 * i, 6 * i + 6);
        if (dot(plate.normal, s) > 0) {
          lit += 1;
          expect(dot(f, s)).toBeLessThan(0);
        } else {
          expect(Array.from(f).every((v) => v === 0)).toBe(true);
        }
      });
      expect(lit).toBeGreaterThanOrEqual(1);
      expect(lit).toBeLessThanOrEqual(3);
    }
  });
});

describe('evaluateSrp invariants', () => {
  const spec = boxWing(true);
  const vehicle = compileVehicle(spec);

  it('the per-surface forces and torques add up to the totals', () => {
    const result = createSrpResult(vehicle, { perSurface: true });
    for (const s of directions(50)) {
      evaluateSrp(result, vehicle, s, P_1AU, 1);
      const sum = [0, 0, 0, 0, 0, 0];
      for (let i = 0; i < vehicle.surfaceCount; i += 1) {
        for (let k = 0; k < 6; k += 1) sum[k]! += result.surfacesBody[6 * i + k]!;
      }
      // the totals are summed in a different order (factored): rounding differences of ~1e-16
      // of the largest term, hence 1e-12 of the magnitude
      expectVecClose(sum.slice(0, 3), result.forceBody, REL_TOL, 1e-22);
      expectVecClose(sum.slice(3), result.torqueBody, 1e-11, 1e-21);
    }
  });

  it('force and torque scale as 1/r²: at 2 au they are a quarter of those at 1 au', () => {
    // source: inverse-square law of irradiance
    const s: Vec3 = [0.48, 0.6, 0.64];
    const at1 = evaluateSrp(createSrpResult(vehicle), vehicle, s, radiationPressureAt(AU_M), 1);
    const at2 = evaluateSrp(createSrpResult(vehicle), vehicle, s, radiationPressureAt(2 * AU_M), 1);
    expectVecClose(at2.forceBody, at1.forceBody.map((v) => v / 4) as Vec3, REL_TOL);
    expectVecClose(at2.torqueBody, at1.torqueBody.map((v) => v / 4) as Vec3, REL_TOL);
  });

  it('turning vehicle and Sun together leaves the body-frame answer unchanged and turns the inertial one', () => {
    const q1 = quatFromAxisAngle(createQuat(), [0.36, 0.48, 0.8], 0.7);
    const turnAxis: Vec3 = [0, 0.6, -0.8];
    const turnAngle = 1.9;
    const turn = quatFromAxisAngle(createQuat(), turnAxis, turnAngle);
    const q2 = multiplyQuat(createQuat(), turn, q1); // the vehicle turned by `turn` (inertial axis)
    // Rodrigues' matrix of the turn, built with mathjs (source: general-purpose reference library)
    const R = math.rotationMatrix(turnAngle, turnAxis) as unknown as number[][];
    const sun1: Vec3 = [0.28, -0.96, 0];
    const sun2 = math.multiply(R, sun1) as unknown as Vec3;

    const a = evaluateSrpInertial(createSrpInertialResult(vehicle), vehicle, q1, sun1, P_1AU, 1);
    const b = evaluateSrpInertial(createSrpInertialResult(vehicle), vehicle, q2, sun2, P_1AU, 1);
    // Rotations add ~1e-16 relative per operation to the Sun direction: 1e-11 is ample.
    expectVecClose(b.body.forceBody, a.body.forceBody, 1e-11);
    expectVecClose(b.body.torqueBody, a.body.torqueBody, 1e-11);
    expectVecClose(b.forceInertial, math.multiply(R, a.forceInertial) as unknown as Vec3, 1e-11);
    expectVecClose(b.torqueInertial, math.multiply(R, a.torqueInertial) as unknown as Vec3, 1e-11);
  });

  it('the inertial answer with the identity attitude equals the body answer', () => {
    const s: Vec3 = [0, 0.6, 0.8];
    const r = evaluateSrpInertial(createSrpInertialResult(vehicle, { perSurface: true }), vehicle, createQuat(), s, P_1AU, 1);
    expect(r.forceInertial).toEqual(r.body.forceBody);
    // `+ 0` folds -0 into 0: an unlit plate's zero may carry either sign
    expect(Array.from(r.surfacesInertial, (x) => x + 0)).toEqual(Array.from(r.body.surfacesBody, (x) => x + 0));
  });

  it('a plate off the centre of mass gets torque r × F about the centre of mass', () => {
    const com: Vec3 = [0.1, -0.2, 0.5];
    const centroid: Vec3 = [1, 2, 3];
    const one = compileVehicle(onePlate({ front: { absorbed: 0.4, specular: 0.4, diffuse: 0.2 }, centroidM: centroid }, com));
    const result = evaluateSrp(createSrpResult(one), one, inXz(0.5), P_1AU, 1);
    const r = math.subtract(centroid, com) as number[];
    // source: r × F computed by mathjs (general-purpose reference library)
    const expected = math.cross(r, [...result.forceBody]) as unknown as Vec3;
    expectVecClose(result.torqueBody, expected, REL_TOL);
  });
});

describe('centreOfPressureBody', () => {
  it('lies on the single plate’s line of action, at the point closest to the centre of mass', () => {
    const com: Vec3 = [0.1, -0.2, 0.5];
    const centroid: Vec3 = [1, 2, 3];
    const v = compileVehicle(onePlate({ front: { absorbed: 0.4, specular: 0.4, diffuse: 0.2 }, centroidM: centroid }, com));
    const result = evaluateSrp(createSrpResult(v), v, inXz(0.5), P_1AU, 1);
    const cp = centreOfPressureBody([0, 0, 0], result, v)!;
    const f = result.forceBody;
    const fromCentroid = cp.map((c, k) => c - centroid[k]!);
    const fromCom = cp.map((c, k) => c - com[k]!);
    // on the line through the centroid along F, and (cp - CoM) ⟂ F; lengths ~1 m, hence 1e-12 m
    expect(norm(cross(fromCentroid, f)) / norm(f)).toBeLessThan(1e-12);
    expect(Math.abs(dot(fromCom, f)) / norm(f)).toBeLessThan(1e-12);
  });

  it('is midway between two equal plates placed symmetrically about the centre of mass', () => {
    const v = compileVehicle({
      kind: 'plates',
      name: 'pair',
      massKg: 10,
      centreOfMassM: [0, 0, 0],
      plates: [
        { name: 'a', areaM2: 1, normal: [0, 0, 1], centroidM: [2, 0, 0], front: MIRROR },
        { name: 'b', areaM2: 1, normal: [0, 0, 1], centroidM: [-2, 0, 0], front: MIRROR },
      ],
    });
    const result = evaluateSrp(createSrpResult(v), v, [0, 0, 1], P_1AU, 1);
    expectVecClose(centreOfPressureBody([9, 9, 9], result, v)!, [0, 0, 0], 0, 1e-15);
  });

  it('is null when there is no force (in umbra)', () => {
    const v = compileVehicle(onePlate({ front: MIRROR }));
    const result = evaluateSrp(createSrpResult(v), v, [0, 0, 1], P_1AU, 0);
    expect(centreOfPressureBody([0, 0, 0], result, v)).toBeNull();
  });
});

describe('evaluateSrp refuses bad calls', () => {
  const v = compileVehicle(onePlate({ front: MIRROR }));

  it('an unnormalised Sun direction, naming sunDirBody', () => {
    expect(() => evaluateSrp(createSrpResult(v), v, [0, 0, 2], P_1AU, 1)).toThrow(srpErrorFor('invalid_input', 'sunDirBody'));
  });

  it('a NaN pressure, naming pressurePa', () => {
    expect(() => evaluateSrp(createSrpResult(v), v, [0, 0, 1], Number.NaN, 1)).toThrow(srpErrorFor('invalid_input', 'pressurePa'));
  });

  it('an illuminated fraction above 1, naming illuminatedFraction', () => {
    expect(() => evaluateSrp(createSrpResult(v), v, [0, 0, 1], P_1AU, 1.2)).toThrow(
      srpErrorFor('out_of_range', 'illuminatedFraction'),
    );
  });

  it('a per-surface buffer made for a smaller vehicle, naming out.surfacesBody', () => {
    const big = compileVehicle(boxWing(true));
    expect(() => evaluateSrp(createSrpResult(v, { perSurface: true }), big, [0, 0, 1], P_1AU, 1)).toThrow(
      srpErrorFor('invalid_input', 'out.surfacesBody'),
    );
  });

  it('writes into and returns the result it was given', () => {
    const out = createSrpResult(v);
    expect(evaluateSrp(out, v, [0, 0, 1], P_1AU, 1)).toBe(out);
  });
});
