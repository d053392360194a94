/**
 * Zonal harmonics of the Earth's gravity field (J2 … J6): the part of the geopotential that
 * depends on latitude only,
 *
 *   U = −(μ/r) Σₙ Jₙ (R/r)ⁿ Pₙ(u),   u = z/r = sin(geocentric latitude),
 *
 * whose gradient, term by term, is (derived here from ∇[r^−(n+1) Pₙ(z/r)] and the identity
 * P'ₙ₊₁ = (n+1) Pₙ + u P'ₙ)
 *
 *   aₙ = (μ Jₙ / r²) (R/r)ⁿ [ P'ₙ₊₁(u) r̂ − P'ₙ(u) ẑ ],
 *
 * with Pₙ and P'ₙ by Bonnet's recursion n Pₙ = (2n−1) u Pₙ₋₁ − (n−1) Pₙ₋₂ and P'ₙ = n Pₙ₋₁ + u P'ₙ₋₁
 * (no division by cos φ, so the poles are regular). For n = 2 this is Vallado's closed form
 * a = −(3/2) J2 μ R²/r⁵ [x (1 − 5u²), y (1 − 5u²), z (3 − 5u²)]
 * (Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. 2013, §8.6.1, eq. 8-30 or
 * near it; equation number from memory), which the tests check.
 *
 * Reference plane: the J2000 mean equator (EQJ xy-plane), i.e. the Earth's pole is taken as fixed
 * at its J2000 direction. The true pole precesses about 20″ per year (and nutates by ~9″), so the
 * oblateness force is mis-oriented by ~1e-4 rad per year from J2000: a standard simplification
 * for budgets, not for precision orbit determination.
 */
import { EARTH_EQUATORIAL_RADIUS, EARTH_GM } from '../../bodies/body-constants';
import { SrpError, requirePositive } from '../../errors';
import type { Vec3 } from '../../math/vec3';
import type { ForceModel } from './force-model';

/**
 * Unnormalised zonal coefficients J2 … J6 of the JGM-3 gravity model (index 0 is J2).
 * Source: JGM-3 (Tapley et al., J. Geophys. Res. 101(B12), 1996) as tabulated in Vallado,
 * Fundamentals of Astrodynamics and Applications (4th ed., 2013), and Montenbruck & Gill,
 * Satellite Orbits (2000), Table 3.x (from memory; the digits agree with several independent
 * code bases that cite those books). EGM96 agrees to the digits shown in J2–J4 within 1e-9
 * relative; EGM2008 differs from J3 onwards at the 1e-4 relative level, immaterial for budgets.
 * JGM-3's reference radius 6378.1363 km and GM 398600.4415 km³/s² go with these values; we use
 * EARTH_EQUATORIAL_RADIUS (6378.137 km) and EARTH_GM, a 1e-7 relative mismatch in J2 R².
 */
export const EARTH_ZONAL_J: readonly number[] = [
  1.08262668355e-3, -2.53265648533e-6, -1.61962159137e-6, -2.27296082869e-7, 5.40681239107e-7,
];

/** Options of `createZonalForce`. */
export interface ZonalForceOptions {
  /** Highest degree included, 2 … 6 (J2 … Jn); default 6. */
  degree?: number;
  /** Jₙ for n = 2 … (index 0 is J2); default EARTH_ZONAL_J (JGM-3). */
  coefficients?: readonly number[];
  /** Gravitational parameter (m³/s²); default EARTH_GM. */
  mu?: number;
  /** Reference radius of the coefficients (m); default EARTH_EQUATORIAL_RADIUS. */
  radiusM?: number;
}

/** Highest degree the recursion buffers are sized for. */
const MAX_DEGREE = 6;

/**
 * Zonal-harmonic acceleration J2 … Jn (not including the central point mass), EQJ, Earth-centred.
 * @throws SrpError naming `degree`, `coefficients`, `mu` or `radiusM`
 */
export function createZonalForce(options: ZonalForceOptions = {}): ForceModel {
  const degree = options.degree ?? MAX_DEGREE;
  const coefficients = options.coefficients ?? EARTH_ZONAL_J;
  const mu = requirePositive(options.mu ?? EARTH_GM, 'mu', 'm^3/s^2');
  const radius = requirePositive(options.radiusM ?? EARTH_EQUATORIAL_RADIUS, 'radiusM', 'm');
  if (!Number.isInteger(degree) || degree < 2 || degree > MAX_DEGREE) {
    throw new SrpError('out_of_range', `degree must be an integer from 2 to ${MAX_DEGREE}; got ${degree}`, {
      field: 'degree',
      value: degree,
      limit: `2..${MAX_DEGREE}`,
    });
  }
  if (coefficients.length < degree - 1 || !coefficients.slice(0, degree - 1).every(Number.isFinite)) {
    throw new SrpError('invalid_input', `coefficients must hold ${degree - 1} finite numbers J2..J${degree}`, {
      field: 'coefficients',
      value: coefficients,
      limit: `${degree - 1} finite numbers`,
    });
  }
  // μ Jₙ Rⁿ and the recursion's ratios (2n−1)/n, (n−1)/n folded once: index n.
  const muJRn = new Float64Array(degree + 1);
  const ratioA = new Float64Array(degree + 1);
  const ratioB = new Float64Array(degree + 1);
  for (let n = 2; n <= degree; n += 1) {
    muJRn[n] = mu * coefficients[n - 2]! * radius ** n;
    ratioA[n] = (2 * n - 1) / n;
    ratioB[n] = (n - 1) / n;
  }
  return {
    name: 'zonal',
    acceleration(out: Vec3, _t: number, y: Float64Array): Vec3 {
      const x = y[0]!;
      const yy = y[1]!;
      const z = y[2]!;
      const r2 = x * x + yy * yy + z * z;
      const r = Math.sqrt(r2);
      const invR = 1 / r;
      const u = z * invR;
      // P₀ = 1, P₁ = u; P'₁ = 1, P'₂ = 3u.
      let pPrev = 1;
      let p = u;
      let dp = 1; // P'₁
      let sumR = 0; // Σ μJₙRⁿ/rⁿ⁺² P'ₙ₊₁ (radial)
      let sumZ = 0; // Σ μJₙRⁿ/rⁿ⁺² P'ₙ   (along ẑ)
      let invRn = invR * invR * invR; // 1/r³, becomes 1/rⁿ⁺² at n
      // Build up to Pₙ, P'ₙ, P'ₙ₊₁ for n = 2 … degree.
      for (let n = 2; n <= degree; n += 1) {
        const pn = ratioA[n]! * u * p - ratioB[n]! * pPrev;
        const dpn = n * p + u * dp; // P'ₙ
        const dpn1 = (n + 1) * pn + u * dpn; // P'ₙ₊₁
        invRn *= invR;
        const k = muJRn[n]! * invRn;
        sumR += k * dpn1;
        sumZ += k * dpn;
        pPrev = p;
        p = pn;
        dp = dpn;
      }
      const kr = sumR * invR;
      out[0] = kr * x;
      out[1] = kr * yy;
      out[2] = kr * z - sumZ;
      return out;
    },
  };
}
