import type { AttitudeLawDefinition } from '@photon-ledger/shared';
import type { AttitudeLawSpec, AttitudeProfile } from '../src/index';

const DEG = Math.PI / 180;

/**
 * An attitude law from a file or HTTP body (shared schema, already parsed; degrees) as srp-core's
 * spec (radians). A tabulated law naming an uploaded profile needs that profile, parsed.
 */
export function attitudeFromDefinition(law: AttitudeLawDefinition, profile?: AttitudeProfile): AttitudeLawSpec {
  switch (law.law) {
    case 'sail-cone-clock': {
      const { coneDeg, clockDeg, ...rest } = law;
      return { ...rest, coneRad: coneDeg * DEG, clockRad: clockDeg * DEG };
    }
    case 'tabulated': {
      const outside = law.outside ?? 'refuse';
      if (law.rows) {
        const timesS = Float64Array.from(law.rows, (r) => r.tS);
        const quaternions = new Float64Array(law.rows.length * 4);
        law.rows.forEach((r, i) => quaternions.set(r.quaternion, i * 4));
        return { law: 'tabulated', profile: { timesS, quaternions }, outside };
      }
      if (!profile) throw new Error(`attitude profile ${law.profileId} must be loaded before the law is built`);
      return { law: 'tabulated', profile, outside };
    }
    default:
      return law;
  }
}
