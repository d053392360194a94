import type { RunEvent } from '@photon-ledger/shared';
import { bodyLabel, eventLabel, isEclipseEvent, phaseLabel, type EclipsePassage } from '../lib/eclipses';
import { formatDuration, formatUtc } from '../lib/format-time';

/** Props of EclipseTable. */
export interface EclipseTableProps {
  passages: readonly EclipsePassage[];
  /** Every event of the run; the non-eclipse ones are listed under the table. */
  events: readonly RunEvent[];
}

/** Eclipse passages (entry, exit, duration; UTC) and the run's other events. */
export function EclipseTable({ passages, events }: EclipseTableProps) {
  const others = events.filter((e) => !isEclipseEvent(e.name));
  const umbraTotal = passages.filter((p) => p.phase === 'umbra' || p.phase === 'shadow').reduce((sum, p) => sum + p.durationS, 0);
  // An eclipse is a passage through the outer shadow (penumbra, or the cylindrical model's one shadow).
  const eclipses = passages.filter((p) => p.phase === 'penumbra' || p.phase === 'shadow');
  const longest = eclipses.reduce<EclipsePassage | null>((best, p) => (!best || p.durationS > best.durationS ? p : best), null);
  return (
    <div className="flex flex-col gap-3">
      {passages.length === 0 ? (
        <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
          No eclipse during this run: the spacecraft stayed in full sunlight (or the scenario's shadow model is off).
        </p>
      ) : (
        <>
          <p className="text-sm text-ink-soft">
            {eclipses.length} {eclipses.length === 1 ? 'eclipse' : 'eclipses'}; total time in umbra{' '}
            <span className="font-mono text-ink">{formatDuration(umbraTotal)}</span>
            {longest && (
              <>
                ; longest eclipse <span className="font-mono text-ink">{formatDuration(longest.durationS)}</span> from first to last contact
              </>
            )}
            .
          </p>
          <div tabIndex={0} role="region" aria-label="Eclipse passages" className="max-h-96 overflow-auto rounded-lg border border-rule bg-paper-raised">
            <table className="w-full min-w-[40rem] text-left text-sm">
              <caption className="sr-only">Eclipse passages with entry, exit and duration in UTC</caption>
              <thead className="sticky top-0 border-b border-rule bg-paper-raised text-xs text-ink-soft">
                <tr>
                  <th scope="col" className="px-3 py-2 font-medium">
                    Shadow of
                  </th>
                  <th scope="col" className="px-3 py-2 font-medium">
                    Phase
                  </th>
                  <th scope="col" className="px-3 py-2 font-medium">
                    Entry (UTC)
                  </th>
                  <th scope="col" className="px-3 py-2 font-medium">
                    Exit (UTC)
                  </th>
                  <th scope="col" className="px-3 py-2 text-right font-medium">
                    Duration
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-rule/70">
                {passages.map((p, i) => (
                  <tr key={`${p.body}-${p.phase}-${p.entry?.tSeconds ?? 'start'}-${i}`}>
                    <td className="px-3 py-1.5">{bodyLabel(p.body)}</td>
                    <td className="px-3 py-1.5">
                      <span className={p.phase === 'penumbra' ? 'text-ink-soft' : 'font-medium'}>{phaseLabel(p.phase)}</span>
                    </td>
                    <td className="px-3 py-1.5 font-mono text-xs whitespace-nowrap">
                      {p.entry ? <time dateTime={p.entry.utc}>{formatUtc(p.entry.utc).replace(' UTC', '')}</time> : 'before the start'}
                    </td>
                    <td className="px-3 py-1.5 font-mono text-xs whitespace-nowrap">
                      {p.exit ? <time dateTime={p.exit.utc}>{formatUtc(p.exit.utc).replace(' UTC', '')}</time> : 'after the end'}
                    </td>
                    <td className="px-3 py-1.5 text-right font-mono text-xs whitespace-nowrap tabular-nums">
                      {p.clipped && <span title="An edge lies outside the run">≥ </span>}
                      {formatDuration(p.durationS)}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      {others.length > 0 && (
        <details className="rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm">
          <summary className="cursor-pointer font-medium">Other events ({others.length})</summary>
          <ul className="mt-2 max-h-64 divide-y divide-rule/70 overflow-auto">
            {others.map((e, i) => (
              <li key={`${e.name}-${e.tSeconds}-${i}`} className="flex justify-between gap-4 py-1">
                <span>{eventLabel(e.name)}</span>
                <time dateTime={e.utc} className="font-mono text-xs">
                  {formatUtc(e.utc)}
                </time>
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
