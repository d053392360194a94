/**
 * The planets seen from the Sun over a scenario span, sampled once from astronomy-engine
 * (`planetPositionHci`) and interpolated (piecewise Chebyshev, as geocentric-ephemeris.ts does for
 * the Sun and the Moon) for the third-body forces of heliocentric runs.
 * Frame: EQJ, Sun-centred (HCI). Positions in metres; time in seconds from the scenario epoch.
 */
import { SrpError } from '../errors';
import type { Vec3 } from '../math/vec3';
import { astroTimeAt, type Epoch } from '../time/epoch';
import { EARTH_GM } from './body-constants';
import { evaluateChebyshevTable, fitChebyshevTable, type ChebyshevTable } from './chebyshev-table';
import { planetNames, planetPositionHci, type PlanetName } from './ephemeris';

/**
 * Gravitational parameters of the planets (m³/s²) as third bodies: the planet with its moons
 * (system GM, the right value seen from afar) except the Earth, whose heliocentric position here
 * is the Earth's centre (not the Earth–Moon barycentre), so it takes EARTH_GM alone; the Moon is
 * then not modelled in heliocentric runs (its pull is 1.2 % of the Earth's, from a point within
 * 384 400 km of it).
 * Source: JPL DE430 (Folkner et al., IPN Progress Report 42-196, 2014, Table 8), in km³/s²:
 * Mercury 22 031.780, Venus 324 858.592, Mars system 42 828.375214, Jupiter system 126 712 764.8,
 * Saturn system 37 940 585.2, Uranus system 5 794 548.6, Neptune system 6 836 527.100580
 * (from memory; five significant digits are all a third-body budget needs).
 */
export const planetGm: Readonly<Record<PlanetName, number>> = {
  mercury: 2.203178e13,
  venus: 3.24858592e14,
  earth: EARTH_GM,
  mars: 4.2828375214e13,
  jupiter: 1.267127648e17,
  saturn: 3.79405852e16,
  uranus: 5.7945486e15,
  neptune: 6.8365271005e15,
};

/**
 * Default segment length per planet (s), with DEFAULT_PLANET_DEGREE: a few per cent of the
 * planet's orbital period (Mercury 4 d of 88 d, the Earth 8 d as the geocentric Sun, Neptune 128 d);
 * the measured interpolation error over a year (see the test) is at most 2.1 cm (Mercury), against
 * theories good to kilometres.
 */
export const DEFAULT_PLANET_SEGMENT_SECONDS: Readonly<Record<PlanetName, number>> = {
  mercury: 4 * 86_400,
  venus: 8 * 86_400,
  earth: 8 * 86_400,
  mars: 16 * 86_400,
  jupiter: 64 * 86_400,
  saturn: 64 * 86_400,
  uranus: 128 * 86_400,
  neptune: 128 * 86_400,
};
/** Default polynomial degree for every planet. */
export const DEFAULT_PLANET_DEGREE = 12;

/** Which planets to fit, and how. */
export interface HeliocentricEphemerisOptions {
  /** Planets to fit; default all of `planetNames` (Mercury … Neptune). */
  planets?: readonly PlanetName[];
  /** Segment length per planet (s); defaults DEFAULT_PLANET_SEGMENT_SECONDS. */
  segmentSeconds?: Partial<Record<PlanetName, number>>;
  /** Polynomial degree; default DEFAULT_PLANET_DEGREE. */
  degree?: number;
}

/** Planet positions (m, HCI EQJ) at any time of a fitted span; evaluation allocates nothing. */
export interface HeliocentricEphemeris {
  /** The scenario epoch the times count from. */
  readonly epoch: Epoch;
  /** First time covered (s from the epoch). */
  readonly startSeconds: number;
  /** Last time covered by every table (s from the epoch); at least the requested end. */
  readonly endSeconds: number;
  /** The planets fitted. */
  readonly planets: readonly PlanetName[];
  /** One table per fitted planet (m, HCI EQJ). */
  readonly tables: Readonly<Partial<Record<PlanetName, ChebyshevTable>>>;
  /**
   * Heliocentric position of a planet's centre (m, HCI EQJ) at tSeconds (s from the epoch).
   * @throws SrpError `invalid_input` for a planet not fitted; `out_of_range` outside the span
   */
  planetPositionAt(out: Vec3, planet: PlanetName, tSeconds: number): Vec3;
}

/**
 * Samples the planets over [startSeconds, endSeconds] after `epoch` and returns the
 * interpolating ephemeris (allocates; call once per run).
 * @param startSeconds first time needed (s from the epoch)
 * @param endSeconds last time needed (s from the epoch)
 * @throws SrpError naming `planets` for an unknown name, or the table's arguments (`endSeconds`, …)
 */
export function createHeliocentricEphemeris(
  epoch: Epoch,
  startSeconds: number,
  endSeconds: number,
  options: HeliocentricEphemerisOptions = {},
): HeliocentricEphemeris {
  const planets = [...(options.planets ?? planetNames)];
  const degree = options.degree ?? DEFAULT_PLANET_DEGREE;
  const tables: Partial<Record<PlanetName, ChebyshevTable>> = {};
  let end = Number.POSITIVE_INFINITY;
  for (const [i, planet] of planets.entries()) {
    if (!planetNames.includes(planet)) {
      throw new SrpError('invalid_input', `planets.${i} must be one of ${planetNames.join(', ')}; got ${String(planet)}`, {
        field: `planets.${i}`,
        value: planet,
        limit: planetNames.join(' | '),
      });
    }
    const table = fitChebyshevTable(
      (out, t) => planetPositionHci(out, planet, astroTimeAt(epoch, t)),
      startSeconds,
      endSeconds,
      options.segmentSeconds?.[planet] ?? DEFAULT_PLANET_SEGMENT_SECONDS[planet],
      degree,
    );
    tables[planet] = table;
    end = Math.min(end, table.endSeconds);
  }
  return {
    epoch,
    startSeconds,
    endSeconds: planets.length === 0 ? endSeconds : end,
    planets,
    tables,
    planetPositionAt(out: Vec3, planet: PlanetName, tSeconds: number): Vec3 {
      const table = tables[planet];
      if (table === undefined) {
        throw new SrpError('invalid_input', `planet '${planet}' was not fitted (fitted: ${planets.join(', ')})`, {
          field: 'planet',
          value: planet,
          limit: planets.join(' | '),
        });
      }
      return evaluateChebyshevTable(out, table, tSeconds);
    },
  };
}
