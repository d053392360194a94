import type { StudyStatistics } from '@photon-ledger/shared';
import { formatValue, lineLabel, lineUnit } from '../lib/study-format';

/** Mean, SD, p95, p99 of each compared line over the succeeded cases. */
export function StudyStatisticsTable({ statistics }: { statistics: StudyStatistics }) {
  return (
    <div className="flex flex-col gap-2">
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 font-medium">Line</th>
              <th className="py-1 pl-3 text-right font-medium">Cases</th>
              <th className="py-1 pl-3 text-right font-medium">Mean</th>
              <th className="py-1 pl-3 text-right font-medium">SD</th>
              <th className="py-1 pl-3 text-right font-medium">95th pct</th>
              <th className="py-1 pl-3 text-right font-medium">99th pct</th>
              <th className="py-1 pl-3 text-right font-medium">Min – max</th>
            </tr>
          </thead>
          <tbody className="font-mono">
            {statistics.lines.map((l) => (
              <tr key={l.line} className="border-t border-rule">
                <td className="py-2 font-sans">
                  {lineLabel(l.line)} <span className="text-xs text-ink-soft">({lineUnit(l.line)})</span>
                </td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">{l.count}</td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">{formatValue(l.mean)}</td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">{formatValue(l.sd)}</td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">{formatValue(l.p95)}</td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">{formatValue(l.p99)}</td>
                <td className="py-2 pl-3 text-right whitespace-nowrap">
                  {formatValue(l.min)} – {formatValue(l.max)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">SD is the sample standard deviation (n − 1). Percentiles: {statistics.percentileMethod}.</p>
    </div>
  );
}
