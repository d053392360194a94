/**
 * Secular drift of the osculating elements: the slope of a least-squares line through a, e, i
 * and RAAN sampled over the span. Short-periodic terms average out over whole revolutions; over
 * a span shorter than a few revolutions the slope carries them too.
 */
import { cartesianToKeplerian, createKeplerianElements } from '../propagation/kepler';
import type { SampleHistory } from './sample-history';

const SECONDS_PER_DAY = 86_400;
const DEG_PER_RAD = 180 / Math.PI;

/** Drift rates per day; null when fewer than two distinct times were sampled. */
export interface SecularDrift {
  /** Semi-major axis (m/day). */
  semiMajorAxisMPerDay: number | null;
  /** Eccentricity (1/day). */
  eccentricityPerDay: number | null;
  /** Inclination (deg/day). */
  inclinationDegPerDay: number | null;
  /** Right ascension of the ascending node, unwrapped (deg/day); null for an equatorial orbit. */
  raanDegPerDay: number | null;
  /** True when any sample was equatorial, where RAAN is undefined (set to 0 by cartesianToKeplerian). */
  equatorial: boolean;
}

/** Running sums of a least-squares line y = c + s·t (t relative to the first sample, for conditioning). */
class LineFit {
  n = 0;
  st = 0;
  sy = 0;
  stt = 0;
  sty = 0;
  add(t: number, y: number): void {
    this.n += 1;
    this.st += t;
    this.sy += y;
    this.stt += t * t;
    this.sty += t * y;
  }
  /** Slope (unit of y per s), or null when the times do not spread. */
  slope(): number | null {
    const d = this.n * this.stt - this.st * this.st;
    // Relative test: d is n²·var(t), which is ≥ 0 and vanishes only for equal times, up to rounding.
    if (!(this.n >= 2) || !(d > 1e-12 * this.n * this.stt)) return null;
    return (this.n * this.sty - this.st * this.sy) / d;
  }
}

/**
 * Least-squares drift per day of a, e, i and RAAN from the osculating elements at every sample
 * (cartesianToKeplerian). RAAN is unwrapped (jumps over π between samples taken as whole turns),
 * and fitted about its first value, so a 0/2π crossing does not spoil the line.
 * Source: ordinary least squares, any numerical analysis text (common practice).
 * @param mu gravitational parameter of the central body (m³/s²)
 * @throws SrpError as cartesianToKeplerian (a rectilinear or parabolic state)
 */
export function secularDrift(history: SampleHistory, mu: number): SecularDrift {
  const { layout, samples, sampleCount } = history;
  const el = createKeplerianElements();
  const state = new Float64Array(6);
  const fa = new LineFit();
  const fe = new LineFit();
  const fi = new LineFit();
  const fo = new LineFit();
  const t0 = samples[layout.t] as number;
  let equatorial = false;
  let raanPrev = 0;
  let raanUnwrapped = 0;
  for (let k = 0; k < sampleCount; k += 1) {
    const o = k * layout.stride;
    for (let j = 0; j < 3; j += 1) {
      state[j] = samples[o + layout.r + j] as number;
      state[3 + j] = samples[o + layout.v + j] as number;
    }
    cartesianToKeplerian(el, state, mu);
    const t = (samples[o + layout.t] as number) - t0;
    fa.add(t, el.semiMajorAxisM);
    fe.add(t, el.eccentricity);
    fi.add(t, el.inclinationRad);
    const sinI = Math.sin(el.inclinationRad);
    // Below this, RAAN is set to 0 or swings with rounding noise: no drift to fit.
    if (sinI < 1e-9) equatorial = true;
    if (k === 0) {
      raanUnwrapped = 0;
    } else {
      let d = el.raanRad - raanPrev;
      d -= 2 * Math.PI * Math.round(d / (2 * Math.PI));
      raanUnwrapped += d;
    }
    raanPrev = el.raanRad;
    fo.add(t, raanUnwrapped);
  }
  const perDay = (s: number | null, scale = 1): number | null => (s === null ? null : s * SECONDS_PER_DAY * scale);
  return {
    semiMajorAxisMPerDay: perDay(fa.slope()),
    eccentricityPerDay: perDay(fe.slope()),
    inclinationDegPerDay: perDay(fi.slope(), DEG_PER_RAD),
    raanDegPerDay: equatorial ? null : perDay(fo.slope(), DEG_PER_RAD),
    equatorial,
  };
}
