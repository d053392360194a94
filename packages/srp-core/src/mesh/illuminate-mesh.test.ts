import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { compileVehicle } from '../vehicles/compile-vehicle';
import { createSrpResult, evaluateSrp } from '../vehicles/evaluate-srp';
import type { SurfaceOptics } from '../vehicles/surface-optics';
import { srpErrorFor } from '../vehicles/vehicle-test-helpers';
import { tableNodeDirection } from './coefficient-table';
import { createMeshIllumination, illuminateMesh, samplePattern } from './illuminate-mesh';
import { createMeshScene } from './mesh-scene';
import { boxPlates, boxWingMesh, MeshBuilder } from './mesh-test-helpers';

const DEG = Math.PI / 180;
/** Optics with every term of the flat-plate formula: specular, diffuse and thermal re-emission. */
const mixed: SurfaceOptics = { absorbed: 0.55, specular: 0.3, diffuse: 0.15, emissivityFront: 0.8, emissivityBack: 0.25 };
const mirror: SurfaceOptics = { absorbed: 0, specular: 1, diffuse: 0 };
const black: SurfaceOptics = { absorbed: 1, specular: 0, diffuse: 0 };

const boxMin: Vec3 = [-0.4, -0.9, 0.2];
const boxMax: Vec3 = [1.6, 0.6, 3.2];
const com: Vec3 = [0.3, -0.1, 1.1];

describe('illuminateMesh: a convex box is exactly the flat-plate model of its faces (issue 8 item 4)', () => {
  // Source of the expected values: evaluateSrp on the 6-plate vehicle (Montenbruck & Gill 2000,
  // §3.4, flat plates each at its centroid); nothing shades on a convex body.
  const plates = compileVehicle({ kind: 'plates', name: 'box', massKg: 100, centreOfMassM: com, plates: boxPlates(boxMin, boxMax, mixed) });
  const plateResult = createSrpResult(plates);
  const cases = [
    { label: '12 triangles, 1 sample, pre-pass on', k: 1, samples: 1, prePass: true, bounce: false },
    { label: '12 triangles, 9 samples, every shadow ray cast', k: 1, samples: 9, prePass: false, bounce: false },
    { label: 'faces cut into 8 × 8 × 2 triangles, 4 samples, every shadow ray cast', k: 8, samples: 4, prePass: false, bounce: false },
    // On a convex body no reflection meets another face: the bounce adds nothing.
    { label: 'faces cut into 4 × 4 × 2 triangles, 4 samples, specular bounce on', k: 4, samples: 4, prePass: false, bounce: true },
  ];
  for (const c of cases) {
    it(`${c.label}: force and torque equal at every node of a 10° grid to 1e-12`, () => {
      const scene = createMeshScene(new MeshBuilder().box('skin', boxMin, boxMax, c.k).mesh(), { default: { front: mixed } });
      const out = createMeshIllumination(scene);
      const sun: Vec3 = [0, 0, 0];
      let worstForce = 0;
      let worstTorque = 0;
      let rays = 0;
      for (let i = 0; i <= 18; i += 1) {
        for (let j = 0; j < 36; j += 1) {
          tableNodeDirection(sun, 10, 19, i, j);
          illuminateMesh(scene, sun, { samplesPerFacet: c.samples, specularBounce: c.bounce, prePass: c.prePass }, out);
          rays += out.rays;
          evaluateSrp(plateResult, plates, sun, 1, 1);
          const f = out.forcePerPressure;
          const t = out.torquePerPressure;
          // Mesh torque is about the origin; the plates' about the centre of mass: τ_CoM = τ_O - r_CoM × F.
          const tc: Vec3 = [
            t[0] - (com[1] * f[2] - com[2] * f[1]),
            t[1] - (com[2] * f[0] - com[0] * f[2]),
            t[2] - (com[0] * f[1] - com[1] * f[0]),
          ];
          const pf = plateResult.forceBody;
          const pt = plateResult.torqueBody;
          const fScale = Math.hypot(...pf);
          // Torque scale: |F| times the box size, so that a torque that cancels to ~0 is judged
          // against the size of its terms rather than against itself.
          const tScale = fScale * 4;
          worstForce = Math.max(worstForce, Math.hypot(f[0] - pf[0], f[1] - pf[1], f[2] - pf[2]) / fScale);
          worstTorque = Math.max(worstTorque, Math.hypot(tc[0] - pt[0], tc[1] - pt[1], tc[2] - pt[2]) / tScale);
          expect(Array.from(out.litFraction).every((x) => x === 0 || x === 1)).toBe(true);
        }
      }
      expect(worstForce).toBeLessThanOrEqual(1e-12);
      expect(worstTorque).toBeLessThanOrEqual(1e-12);
      // With the pre-pass every face of a convex box is known unshadowable: no ray is cast.
      if (c.prePass) expect(rays).toBe(0);
      else expect(rays).toBeGreaterThan(0);
    });
  }
});

/** Length of the overlap of [a0, a1] and [b0, b1]. */
const overlap = (a0: number, a1: number, b0: number, b1: number) => Math.max(0, Math.min(a1, b1) - Math.max(a0, b0));

describe('illuminateMesh: a plate shading another gives the analytic shadow (issue 8 item 4)', () => {
  // Upper square [-0.5, 0.5]² at z = 1, lower square of side 1 centred on (0.1, 0.05) at z = 0,
  // both facing +z. Source of the expected value: the upper square's shadow on z = 0 is the square
  // moved by -(sx, sy)/sz; the lower plate's lit area is 1 minus its overlap with that.
  const sun: Vec3 = [Math.sin(25 * DEG) * Math.cos(40 * DEG), Math.sin(25 * DEG) * Math.sin(40 * DEG), Math.cos(25 * DEG)];
  const shiftX = -sun[0] / sun[2];
  const shiftY = -sun[1] / sun[2];
  const lowerX: [number, number] = [-0.4, 0.6];
  const lowerY: [number, number] = [-0.45, 0.55];
  const shaded = overlap(lowerX[0], lowerX[1], -0.5 + shiftX, 0.5 + shiftX) * overlap(lowerY[0], lowerY[1], -0.5 + shiftY, 0.5 + shiftY);
  const analyticLit = 1 - shaded;
  const mesh = new MeshBuilder()
    .parallelogram('upper', [-0.5, -0.5, 1], [1, 0, 0], [0, 1, 0], 2)
    .parallelogram('lower', [lowerX[0], lowerY[0], 0], [1, 0, 0], [0, 1, 0], 12)
    .mesh();
  const scene = createMeshScene(mesh, { default: { front: black } });
  const lowerGroup = mesh.groupNames.indexOf('lower');
  const out = createMeshIllumination(scene);

  function litArea(samples: number): number {
    illuminateMesh(scene, sun, { samplesPerFacet: samples, specularBounce: false }, out);
    let lit = 0;
    for (let t = 0; t < scene.triangleCount; t += 1) {
      if (mesh.groupOfTriangle[t] === lowerGroup) lit += scene.area[t]! * out.litFraction[t]!;
    }
    return lit;
  }

  it('the lit area converges on 1 - overlap as samples grow (errors printed)', () => {
    expect(shaded).toBeGreaterThan(0.2); // the geometry really shades a good part
    const errors = [1, 4, 16, 64].map((samples) => Math.abs(litArea(samples) - analyticLit));
    console.log(
      `plate shading plate: analytic lit area ${analyticLit.toFixed(6)} m²; |error| with 1, 4, 16, 64 samples per facet: ` +
        errors.map((e) => e.toExponential(2)).join(', '),
    );
    // Measured: 8.2e-3, 3.1e-3, 3.1e-3, 3.1e-4 m² on a 1 m² plate (12 × 12 × 2 triangles, the
    // error comes from the triangles the shadow edge crosses); bounds with margin.
    expect(errors[0]!).toBeLessThan(0.015);
    expect(errors[3]!).toBeLessThan(6e-4);
    expect(errors[3]!).toBeLessThan(errors[0]! / 4);
    expect(errors[2]!).toBeLessThan(errors[0]!);
  });

  it('the absorbed force is -P A_lit cos θ s and the upper plate is fully lit', () => {
    illuminateMesh(scene, sun, { samplesPerFacet: 64, specularBounce: false }, out);
    const lit = litArea(64);
    // Flat absorber (c0 = 1, c1 = c2 = 0): F/P = -(A_upper + A_lit) cos θ s.
    const k = -(1 + lit) * sun[2];
    const f = out.forcePerPressure;
    for (let a = 0; a < 3; a += 1) expect(f[a]).toBeCloseTo(k * sun[a]!, 12);
    const upper = mesh.groupNames.indexOf('upper');
    for (let t = 0; t < scene.triangleCount; t += 1) if (mesh.groupOfTriangle[t] === upper) expect(out.litFraction[t]).toBe(1);
  });
});

describe('illuminateMesh: skipping rays by the exact culling tests changes nothing', () => {
  it('a box-wing with a dish shading its bus: same lit fractions, force and torque with and without culling, fewer rays', () => {
    const scene = createMeshScene(boxWingMesh({ bus: 4, wing: 9, dish: 4 }), {
      default: { front: 'mli-kapton' },
      groups: { wing: { front: 'solar-cell', back: 'solar-array-back' }, dish: { front: 'osr-radiator', back: 'mli-kapton' } },
    });
    const culled = createMeshIllumination(scene);
    const every = createMeshIllumination(scene);
    const sun: Vec3 = [0, 0, 0];
    let shaded = 0;
    let raysCulled = 0;
    let raysEvery = 0;
    for (let i = 0; i <= 12; i += 1) {
      for (let j = 0; j < 24; j += 1) {
        tableNodeDirection(sun, 15, 13, i, j);
        const specularBounce = j % 2 === 0; // with and without bounce rays
        illuminateMesh(scene, sun, { samplesPerFacet: 9, specularBounce }, culled);
        illuminateMesh(scene, sun, { samplesPerFacet: 9, specularBounce, prePass: false }, every);
        expect(culled.litFraction).toEqual(every.litFraction);
        expect(culled.forcePerPressure).toEqual(every.forcePerPressure);
        expect(culled.torquePerPressure).toEqual(every.torquePerPressure);
        if (!specularBounce) {
          raysCulled += culled.rays;
          raysEvery += every.rays;
        }
        shaded += Array.from(culled.litFraction).filter((x) => x > 0 && x < 1).length;
      }
    }
    expect(shaded).toBeGreaterThan(100); // partial shading really happens
    console.log(`culling: ${raysCulled} shadow rays instead of ${raysEvery}`);
    expect(raysCulled).toBeLessThan(raysEvery / 2);
  });
});

describe('illuminateMesh: a single absorbing square facing the Sun (sanity)', () => {
  it('F = -P A s through the centroid (flat plate, common practice)', () => {
    const scene = createMeshScene(new MeshBuilder().parallelogram('sq', [1, 2, 3], [2, 0, 0], [0, 2, 0], 3).mesh(), {
      default: { front: black },
    });
    const out = illuminateMesh(scene, [0, 0, 1], { samplesPerFacet: 4, specularBounce: false }, createMeshIllumination(scene));
    expect(out.forcePerPressure[0]).toBe(0);
    expect(out.forcePerPressure[1]).toBe(0);
    expect(out.forcePerPressure[2]).toBeCloseTo(-4, 13);
    // Torque about the origin: r × F with r the centroid (2, 3, 3).
    expect(out.torquePerPressure[0]).toBeCloseTo(3 * -4, 12);
    expect(out.torquePerPressure[1]).toBeCloseTo(-2 * -4, 12);
    expect(out.torquePerPressure[2]).toBeCloseTo(0, 12);
    // From behind, a one-sided square takes nothing.
    illuminateMesh(scene, [0, 0, -1], { samplesPerFacet: 4, specularBounce: false }, out);
    expect(Array.from(out.forcePerPressure)).toEqual([0, 0, 0]);
  });
});

describe('illuminateMesh: specular bounce', () => {
  // Two ideal mirrors meeting at 90° along the z axis (x = 0 facing +x, y = 0 facing +y), each
  // L × H, lit along the bisector s = (1, 1, 0)/√2: every ray bounces once off each mirror and
  // leaves along s (a corner reflector). Momentum: the beam through the aperture A_ap = √2 L H
  // comes in along -s and leaves along +s, so F = -2 P A_ap s.
  const L = 1.5;
  const H = 0.8;
  const mesh = new MeshBuilder()
    .parallelogram('mirror x', [0, 0, 0], [0, L, 0], [0, 0, H], 3, 2)
    .parallelogram('mirror y', [0, 0, 0], [0, 0, H], [L, 0, 0], 2, 3)
    .mesh();
  const scene = createMeshScene(mesh, { default: { front: mirror } });
  const s: Vec3 = [Math.SQRT1_2, Math.SQRT1_2, 0];
  const out = createMeshIllumination(scene);
  const aperture = Math.SQRT2 * L * H;

  it('with the bounce, a 90° corner of mirrors returns the light: F = -2 P A_aperture s', () => {
    illuminateMesh(scene, s, { samplesPerFacet: 4, specularBounce: true }, out);
    const f = out.forcePerPressure;
    for (let k = 0; k < 3; k += 1) expect(f[k]).toBeCloseTo(-2 * aperture * s[k]!, 12);
    expect(Array.from(out.litFraction).every((x) => x === 1)).toBe(true);
  });

  it('without it, each mirror alone pushes along its normal: half the along-s force', () => {
    illuminateMesh(scene, s, { samplesPerFacet: 4, specularBounce: false }, out);
    const f = out.forcePerPressure;
    // Each mirror: -2 P A cos²45° n = -P A n; sum -P L H (1, 1, 0) = -P A_aperture s.
    for (let k = 0; k < 3; k += 1) expect(f[k]).toBeCloseTo(-aperture * s[k]!, 12);
  });

  it('the bounce adds the beam at the hit points: the torque matches the sum over both mirrors', () => {
    // With the bounce each mirror takes -P A n from the Sun and -P A n from the other mirror's
    // beam; the beam from mirror x hits mirror y at the mirror image of its sample point, so by
    // symmetry the total torque about the origin is that of -2 P A n acting at each mirror's centroid.
    illuminateMesh(scene, s, { samplesPerFacet: 4, specularBounce: true }, out);
    const A = L * H;
    const fx = -2 * A; // on mirror x, along +x... at centroid (0, L/2, H/2)
    const fy = -2 * A; // on mirror y, along +y, at centroid (L/2, 0, H/2)
    // τ = r × F: mirror x: (0, L/2, H/2) × (fx, 0, 0) = (0, H/2 fx, -L/2 fx);
    // mirror y: (L/2, 0, H/2) × (0, fy, 0) = (-H/2 fy, 0, L/2 fy).
    const expected: Vec3 = [(-H / 2) * fy, (H / 2) * fx, (-L / 2) * fx + (L / 2) * fy];
    for (let k = 0; k < 3; k += 1) expect(out.torquePerPressure[k]).toBeCloseTo(expected[k]!, 12);
  });
});

describe('illuminateMesh and createMeshScene refuse bad input', () => {
  const mesh = new MeshBuilder().box('bus', [0, 0, 0], [1, 1, 1]).parallelogram('wing', [0, 1, 0], [0, 2, 0], [0, 0, 1]).mesh();

  it('an optics group the mesh does not have names optics.groups.<name> and lists the groups', () => {
    expect(() => createMeshScene(mesh, { default: { front: black }, groups: { antenna: { front: black } } })).toThrow(
      srpErrorFor('invalid_input', 'optics.groups.antenna'),
    );
    expect(() => createMeshScene(mesh, { default: { front: black }, groups: { antenna: { front: black } } })).toThrow(/'bus', 'wing'/);
  });

  it('bad optics name their field', () => {
    expect(() =>
      createMeshScene(mesh, { default: { front: black }, groups: { wing: { front: { absorbed: 0.5, specular: 0.6, diffuse: 0 } } } }),
    ).toThrow(srpErrorFor('optics_sum', 'optics.groups.wing.front'));
  });

  it('samplesPerFacet must be a square of 1..8, the Sun direction a unit vector', () => {
    const scene = createMeshScene(mesh, { default: { front: black } });
    const out = createMeshIllumination(scene);
    expect(() => illuminateMesh(scene, [0, 0, 1], { samplesPerFacet: 5, specularBounce: false }, out)).toThrow(
      srpErrorFor('invalid_input', 'samplesPerFacet'),
    );
    expect(() => illuminateMesh(scene, [0, 0, 1], { samplesPerFacet: 81, specularBounce: false }, out)).toThrow(
      srpErrorFor('invalid_input', 'samplesPerFacet'),
    );
    expect(() => illuminateMesh(scene, [0, 0, 2], { samplesPerFacet: 1, specularBounce: false }, out)).toThrow(
      srpErrorFor('invalid_input', 'sunDirBody'),
    );
  });

  it('the sample pattern has n² points in the triangle whose mean is the centroid', () => {
    for (let n = 1; n <= 8; n += 1) {
      const p = samplePattern(n);
      expect(p.length).toBe(2 * n * n);
      let a = 0;
      let b = 0;
      for (let k = 0; k < p.length; k += 2) {
        expect(p[k]! > 0 && p[k + 1]! > 0 && p[k]! + p[k + 1]! < 1).toBe(true);
        a += p[k]!;
        b += p[k + 1]!;
      }
      expect(a / (n * n)).toBeCloseTo(1 / 3, 14);
      expect(b / (n * n)).toBeCloseTo(1 / 3, 14);
    }
  });
});
