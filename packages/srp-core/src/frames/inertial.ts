/**
 * The one inertial frame of Photon Ledger: the mean equator and equinox of J2000, which
 * astronomy-engine calls EQJ (the same axes as EME2000 and, to within 0.1 arcsec, the ICRF).
 * Its origin is the Earth's centre for Earth orbits and the Sun's centre for heliocentric ones.
 * Vector names carry it: `…Eci` = Earth-centred EQJ axes (`rSatEci`, `sunPosEci`),
 * `…Hci` = Sun-centred EQJ axes (`rSatHci`).
 */

/** Short name of the inertial frame, for exports and file headers. */
export const INERTIAL_FRAME = 'EQJ';

/** Human-readable name of the inertial frame, for exports and page labels. */
export const INERTIAL_FRAME_LABEL = 'EQJ (J2000 equatorial)';
