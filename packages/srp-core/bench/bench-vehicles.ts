/** Vehicles shared by the benchmarks (invented, demo-like). */
import type { PlateVehicleSpec } from '../src/vehicles/vehicle-spec';

const DEG = Math.PI / 180;

/** The 10-plate box-wing used by the benchmarks: a 6-face bus, two Sun-tracking wings, a reflector, a sunshade. */
export const benchBoxWing: PlateVehicleSpec = {
  kind: 'plates',
  name: 'bench box-wing',
  massKg: 4200,
  centreOfMassM: [0.05, -0.02, 1.4],
  plates: [
    { name: '+x', areaM2: 6.6, normal: [1, 0, 0], centroidM: [1.2, 0, 1.5], front: 'mli-kapton' },
    { name: '-x', areaM2: 6.6, normal: [-1, 0, 0], centroidM: [-1.2, 0, 1.5], front: 'mli-kapton' },
    { name: '+y', areaM2: 7.2, normal: [0, 1, 0], centroidM: [0, 1.1, 1.5], front: 'osr-radiator' },
    { name: '-y', areaM2: 7.2, normal: [0, -1, 0], centroidM: [0, -1.1, 1.5], front: 'osr-radiator' },
    { name: '+z', areaM2: 5.28, normal: [0, 0, 1], centroidM: [0, 0, 3], front: 'mli-kapton' },
    { name: '-z', areaM2: 5.28, normal: [0, 0, -1], centroidM: [0, 0, 0], front: 'mli-kapton' },
    {
      name: 'wing +y',
      areaM2: 35,
      normal: [1, 0, 0],
      centroidM: [0, 9, 1.5],
      front: 'solar-cell',
      back: 'solar-array-back',
      trackingAxis: [0, 1, 0],
    },
    {
      name: 'wing -y',
      areaM2: 35,
      normal: [1, 0, 0],
      centroidM: [0, -9, 1.5],
      front: 'solar-cell',
      back: 'solar-array-back',
      trackingAxis: [0, -1, 0],
      trackingLimitsRad: [-150 * DEG, 150 * DEG],
    },
    { name: 'reflector', areaM2: 5.31, normal: [0, 0, 1], centroidM: [1.8, 0, 3.2], front: 'white-paint', back: 'black-paint' },
    { name: 'sunshade', areaM2: 1.2, normal: [1, 0, 0], centroidM: [1.6, 0.4, 2.8], front: 'white-paint' },
  ],
};
