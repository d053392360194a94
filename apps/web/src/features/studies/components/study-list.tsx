import { Link } from 'react-router-dom';
import type { Study } from '@photon-ledger/shared';
import { studyPagePath } from '../api/study-path';
import { StudyStatusBadge } from './study-progress';

/** The mission's studies: name, design, progress. */
export function StudyList({ missionId, studies }: { missionId: string; studies: readonly Study[] }) {
  if (studies.length === 0) return <p className="text-sm text-ink-soft">No trade studies yet.</p>;
  return (
    <div className="overflow-x-auto rounded-md border border-rule bg-paper-raised">
    <table className="w-full text-left text-sm">
      <thead className="bg-paper-sunk/60 text-xs text-ink-soft">
        <tr>
          <th className="px-3 py-2 font-medium">Study</th>
          <th className="px-3 py-2 font-medium">Design</th>
          <th className="px-3 py-2 text-right font-medium">Cases done</th>
          <th className="px-3 py-2 font-medium">Status</th>
        </tr>
      </thead>
      <tbody>
        {studies.map((s) => (
          <tr key={s.id} className="border-t border-rule">
            <td className="px-3 py-2">
              <Link to={studyPagePath(missionId, s.id)} className="font-medium underline-offset-2 hover:underline">
                {s.name}
              </Link>
            </td>
            <td className="px-3 py-2">{s.design.kind === 'grid' ? 'Sweep' : `Monte Carlo, seed ${s.design.seed}`}</td>
            <td className="px-3 py-2 text-right font-mono">
              {s.progress.succeeded + s.progress.failed + s.progress.cancelled} / {s.progress.total}
            </td>
            <td className="px-3 py-2">
              <StudyStatusBadge study={s} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
    </div>
  );
}
