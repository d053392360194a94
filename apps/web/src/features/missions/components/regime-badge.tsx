import type { MissionRegime } from '@photon-ledger/shared';
import { Badge } from '../../../components/ui/badge';
import { regimeLabels } from './regime-label';

/** The regime of a mission as a badge: ink for Earth orbit, sodium for heliocentric. */
export function RegimeBadge({ regime }: { regime: MissionRegime }) {
  return <Badge tone={regime === 'heliocentric' ? 'sodium' : 'ink'}>{regimeLabels[regime]}</Badge>;
}
