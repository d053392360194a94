import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../math/vec3';
import { astroTimeAt, parseUtcEpoch } from '../time/epoch';
import { planetNames, planetPositionHci } from './ephemeris';
import { createHeliocentricEphemeris, planetGm } from './heliocentric-ephemeris';

const epoch = parseUtcEpoch('2027-01-01T00:00:00Z');
const YEAR = 365.25 * 86_400;

describe('createHeliocentricEphemeris', () => {
  it('interpolates every planet over a year within 0.1 m of astronomy-engine', () => {
    // Measured: 5 mm (Saturn) to 2.1 cm (Mercury), at 97 times per planet off the Chebyshev nodes;
    // 0.1 m against theories good to kilometres: the interpolation adds nothing that matters.
    const eph = createHeliocentricEphemeris(epoch, 0, YEAR);
    const got: Vec3 = [0, 0, 0];
    const want: Vec3 = [0, 0, 0];
    for (const planet of planetNames) {
      let worst = 0;
      for (let i = 0; i <= 96; i += 1) {
        const t = (YEAR * (i + 0.37)) / 97;
        eph.planetPositionAt(got, planet, t);
        planetPositionHci(want, planet, astroTimeAt(epoch, t));
        worst = Math.max(worst, Math.hypot(got[0] - want[0], got[1] - want[1], got[2] - want[2]));
      }
      expect(worst, planet).toBeLessThan(0.1);
    }
  });

  it('covers at least the requested span and fits only the planets asked for', () => {
    const eph = createHeliocentricEphemeris(epoch, 0, 10 * 86_400, { planets: ['venus', 'jupiter'] });
    expect(eph.endSeconds).toBeGreaterThanOrEqual(10 * 86_400);
    expect(Object.keys(eph.tables).sort()).toEqual(['jupiter', 'venus']);
    expect(() => eph.planetPositionAt([0, 0, 0], 'mars', 0)).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ field: 'planet' }) }),
    );
  });

  it('refuses an unknown planet, naming planets.<i>', () => {
    expect(() => createHeliocentricEphemeris(epoch, 0, 86_400, { planets: ['venus', 'pluto' as 'mars'] })).toThrow(
      expect.objectContaining({ code: 'invalid_input', details: expect.objectContaining({ field: 'planets.1' }) }),
    );
  });

  it('lists system GMs from DE430 with Jupiter the largest', () => {
    // source: Folkner et al. (2014), DE430, Table 8 (from memory): Jupiter system 126 712 764.8 km³/s².
    expect(planetGm.jupiter).toBeCloseTo(1.267127648e17, -8);
    expect(Math.max(...Object.values(planetGm))).toBe(planetGm.jupiter);
  });
});
