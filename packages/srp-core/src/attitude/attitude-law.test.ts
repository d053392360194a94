import { describe, expect, it } from 'vitest';
import type { ReadonlyVec3 } from '../math/vec3';
import { attitudeAt, attitudeLawKinds, createAttitudeLaw } from './attitude-law';
import type { AttitudeLawSpec } from './attitude-law';
import { createQuat } from './quaternion';

const R: ReadonlyVec3 = [6.9e6, 1.2e6, 0.8e6]; // m, an invented low Earth orbit state
const V: ReadonlyVec3 = [-1.0e3, 5.0e3, 5.5e3]; // m/s
const SUN: ReadonlyVec3 = [1.2e11, -0.8e11, -0.3e11]; // m

const specs: AttitudeLawSpec[] = [
  { law: 'inertial', quaternion: [0.5, 0.5, -0.5, 0.5] },
  { law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [0, 1, 0], secondaryReference: 'orbit-normal' },
  { law: 'lvlh' },
  { law: 'sail-cone-clock', normalAxisBody: [1, 0, 0], coneRad: 0.6, clockRad: 1.2 },
  { law: 'tabulated', profile: { timesS: [0, 100], quaternions: [1, 0, 0, 0, 0, 1, 0, 0] } },
];

describe('attitudeAt', () => {
  it('every law is reachable through the one signature, writes into out, returns it and gives a unit quaternion', () => {
    expect(specs.map((s) => s.law)).toEqual([...attitudeLawKinds]);
    for (const spec of specs) {
      const law = createAttitudeLaw(spec);
      const out = createQuat();
      const result = attitudeAt(out, law, 42, R, V, SUN);
      expect(result).toBe(out);
      // Unit norm to 1e-12: normalised at the end of every law, a few roundings off at most.
      expect(Math.abs(Math.hypot(...out) - 1)).toBeLessThan(1e-12);
    }
  });

  it('the inertial law returns its quaternion, normalised, whatever the state and time', () => {
    const law = createAttitudeLaw({ law: 'inertial', quaternion: [1.00004, 0, 0, 0] });
    expect(Array.from(attitudeAt(createQuat(), law, 1e9, [0, 0, 0], [0, 0, 0], [0, 0, 0]))).toEqual([1, 0, 0, 0]);
  });

  it('an inertial quaternion off unit norm and an unknown law are refused naming the field', () => {
    expect(() => createAttitudeLaw({ law: 'inertial', quaternion: [1, 0.1, 0, 0] }, 'scenario.attitude')).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'scenario.attitude.quaternion' }) }),
    );
    expect(() => createAttitudeLaw({ law: 'spin' } as unknown as AttitudeLawSpec)).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'attitude.law' }) }),
    );
  });
});
