import type { MissionDetail } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { RegimeBadge } from './regime-badge';

/** The head of a mission page: name, regime, identifiers and summary. */
export function MissionOverview({ mission }: { mission: MissionDetail }) {
  return (
    <header className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold">{mission.name}</h1>
        <RegimeBadge regime={mission.regime} />
      </div>
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-xs">
        <div className="flex gap-1.5">
          <dt className="text-ink-soft">Slug</dt>
          <dd className="font-mono">{mission.slug}</dd>
        </div>
        <div className="flex gap-1.5">
          <dt className="text-ink-soft">Mission id</dt>
          <dd className="font-mono break-all">{mission.id}</dd>
        </div>
        <div className="flex gap-1.5">
          <dt className="text-ink-soft">Created</dt>
          <dd className="font-mono">
            <time dateTime={mission.createdAt}>{formatUtcDate(mission.createdAt)}</time> UTC
          </dd>
        </div>
      </dl>
      <p className="max-w-3xl text-sm leading-relaxed whitespace-pre-line">
        {mission.summary || <span className="text-ink-soft">No summary yet.</span>}
      </p>
    </header>
  );
}
