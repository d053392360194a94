import type { ReviewState } from '@photon-ledger/shared';
import { Badge, type BadgeTone } from '../../../components/ui/badge';

export const reviewStateLabels: Record<ReviewState, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  approved: 'Approved',
  'changes-requested': 'Changes requested',
};

const tones: Record<ReviewState, BadgeTone> = { draft: 'ink', 'in-review': 'sodium', approved: 'sage', 'changes-requested': 'sodium' };

/** The review state as a badge. */
export function ReviewStateBadge({ state }: { state: ReviewState }) {
  return <Badge tone={tones[state]}>{reviewStateLabels[state]}</Badge>;
}
