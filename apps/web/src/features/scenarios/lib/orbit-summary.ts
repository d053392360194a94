import type { InitialOrbit } from '@photon-ledger/shared';

/** 1 AU (km), IAU 2012 Resolution B2. */
const AU_KM = 149_597_870.7;

function sig(value: number, digits: number): string {
  return Number(value.toPrecision(digits)).toLocaleString('en-GB', { maximumFractionDigits: 12 });
}

/**
 * An orbit in one line: `a 42,164 km · e 0.0002 · i 0.05°` (heliocentric semi-major axes in AU), or
 * the distance from the centre for a position-and-velocity state.
 */
export function orbitSummary(orbit: InitialOrbit): string {
  const helio = orbit.centralBody === 'sun';
  const distance = (km: number) => (helio ? `${sig(km / AU_KM, 5)} AU` : `${sig(km, 6)} km`);
  if (orbit.kind === 'keplerian') {
    return `a ${distance(orbit.semiMajorAxisKm)} · e ${sig(orbit.eccentricity, 3)} · i ${sig(orbit.inclinationDeg, 4)}°`;
  }
  return `r ${distance(Math.hypot(...orbit.positionKm))} (state vector)`;
}

/** A span in days, with hours for a short one: "30 d", "0.5 d (12 h)". */
export function spanSummary(spanDays: number): string {
  const days = `${sig(spanDays, 4)} d`;
  return spanDays < 1 ? `${days} (${sig(spanDays * 24, 3)} h)` : days;
}
