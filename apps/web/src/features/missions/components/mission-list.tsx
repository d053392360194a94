import { Link } from 'react-router-dom';
import type { Mission } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { RegimeBadge } from './regime-badge';

/** Missions as cards; each card's link is named after its mission and covers the whole card. */
export function MissionList({ missions }: { missions: readonly Mission[] }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
      {missions.map((mission) => (
        <li key={mission.id}>
          <article className="relative flex h-full flex-col gap-2 rounded-lg border border-rule bg-paper-raised p-4 transition-[background-color,border-color] hover:border-rule-strong hover:bg-white has-[a:focus-visible]:outline-2 has-[a:focus-visible]:outline-offset-2 has-[a:focus-visible]:outline-sodium">
            <div className="flex items-start justify-between gap-3">
              <h2 className="text-base leading-snug font-semibold">
                <Link
                  to={`/missions/${mission.id}`}
                  className="outline-none after:absolute after:inset-0 after:content-[''] hover:text-sodium-deep"
                >
                  {mission.name}
                </Link>
              </h2>
              <RegimeBadge regime={mission.regime} />
            </div>
            <p className="line-clamp-3 text-sm text-ink-soft">{mission.summary || 'No summary.'}</p>
            <p className="mt-auto flex flex-wrap gap-x-3 pt-1 font-mono text-xs text-ink-soft">
              <span>{mission.slug}</span>
              <span>
                created <time dateTime={mission.createdAt}>{formatUtcDate(mission.createdAt)}</time>
              </span>
            </p>
          </article>
        </li>
      ))}
    </ul>
  );
}
