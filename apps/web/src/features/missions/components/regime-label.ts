import type { MissionRegime } from '@photon-ledger/shared';

/** How each mission regime is named to people. */
export const regimeLabels: Readonly<Record<MissionRegime, string>> = {
  'earth-orbit': 'Earth orbit',
  heliocentric: 'Heliocentric',
};
