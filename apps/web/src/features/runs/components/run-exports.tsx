import { buttonClasses } from '../../../components/ui/button';
import { runPath } from '../api/run-path';

/** The run's downloads: ephemeris as CSV and CCSDS OEM, the budget as CSV. */
export function RunExports({ missionId, runId }: { missionId: string; runId: string }) {
  const base = `${runPath(missionId, runId)}/export`;
  const exports = [
    { href: `${base}/ephemeris.csv`, label: 'Download CSV ephemeris', hint: 'Position and velocity (EQJ, m and m/s), SRP columns; UTC and seconds from epoch.' },
    { href: `${base}/ephemeris.oem`, label: 'Download CCSDS OEM', hint: 'Orbit Ephemeris Message, KVN (CCSDS 502.0-B-3), for the next tool in the chain.' },
    { href: `${base}/budget.csv`, label: 'Download budget CSV', hint: 'Budget lines with requirements, margins and status as of now.' },
  ];
  return (
    <ul className="grid gap-3 sm:grid-cols-3">
      {exports.map((e) => (
        <li key={e.href} className="flex flex-col gap-1.5 rounded-lg border border-rule bg-paper-raised p-3">
          <a href={e.href} download className={buttonClasses('secondary', 'sm') + ' self-start'}>
            <span aria-hidden="true">↓</span>
            {e.label}
          </a>
          <p className="text-xs text-ink-soft">{e.hint}</p>
        </li>
      ))}
    </ul>
  );
}
