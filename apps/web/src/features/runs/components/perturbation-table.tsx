import type { RunBudgetReport } from '@photon-ledger/shared';
import { cx } from '../../../lib/cx';
import { formatNumber, formatQuantity, superscript } from '../lib/format-number';

type Perturbation = RunBudgetReport['perturbations'][number];

const forceLabels: Record<string, string> = {
  'central-body': 'Central body (point mass)',
  zonal: 'Zonal harmonics',
  sun: 'Sun (third body)',
  moon: 'Moon (third body)',
  srp: 'Solar radiation pressure',
};

/** Readable name of a force of the propagation. */
export function forceLabel(force: string): string {
  return forceLabels[force] ?? force.replace(/-/g, ' ');
}

/** Decades of a log axis covering every positive value: [floor(log10 min), ceil(log10 max)]. */
export function logDecades(values: readonly number[]): [number, number] {
  const positive = values.filter((v) => v > 0 && Number.isFinite(v));
  if (positive.length === 0) return [-9, 0];
  const low = Math.floor(Math.log10(Math.min(...positive)));
  const high = Math.ceil(Math.log10(Math.max(...positive)));
  return [low, high === low ? low + 1 : high];
}

/** The forces of the run side by side on a log scale: mean (bar) and maximum (tick) acceleration, and SRP's share of each. */
export function PerturbationTable({ perturbations }: { perturbations: readonly Perturbation[] }) {
  if (perturbations.length === 0) {
    return <p className="text-sm text-ink-soft">This run stored no force comparison.</p>;
  }
  const sorted = [...perturbations].sort((a, b) => b.meanAccel - a.meanAccel);
  const [low, high] = logDecades(sorted.flatMap((p) => [p.meanAccel, p.maxAccel]));
  const position = (v: number) => (v > 0 ? ((Math.log10(v) - low) / (high - low)) * 100 : 0);
  const decades = Array.from({ length: high - low + 1 }, (_, i) => low + i);

  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full min-w-[46rem] text-left text-sm">
        <caption className="sr-only">Mean and maximum acceleration of each force, and the ratio of SRP to it</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Force
            </th>
            <th scope="col" className="w-[38%] px-3 py-2 font-medium">
              <span className="sr-only">Acceleration on a log scale</span>
              <span aria-hidden="true" className="relative block h-4">
                {decades.map((d) => (
                  <span
                    key={d}
                    className="absolute -translate-x-1/2 font-mono text-[10px]"
                    style={{ left: `${((d - low) / (high - low)) * 100}%` }}
                  >
                    10{superscript(d)}
                  </span>
                ))}
              </span>
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Mean |a|
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              Max |a|
            </th>
            <th scope="col" className="px-3 py-2 text-right font-medium">
              SRP / force (mean)
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule/70">
          {sorted.map((p) => {
            const srp = p.force === 'srp';
            return (
              <tr key={p.force} className={cx(srp && 'bg-sodium-wash/40')}>
                <th scope="row" className={cx('px-3 py-2 whitespace-nowrap', srp ? 'font-semibold' : 'font-normal')}>
                  {forceLabel(p.force)}
                </th>
                <td className="px-3 py-2" aria-hidden="true">
                  <div className="relative h-4">
                    {decades.map((d) => (
                      <span key={d} className="absolute inset-y-0 w-px bg-rule" style={{ left: `${((d - low) / (high - low)) * 100}%` }} />
                    ))}
                    <span
                      className={cx('absolute inset-y-0.5 left-0 rounded-r-sm', srp ? 'bg-sodium' : 'bg-sage')}
                      style={{ width: `${position(p.meanAccel)}%` }}
                    />
                    <span className="absolute -inset-y-0.5 w-0.5 bg-ink" style={{ left: `${position(p.maxAccel)}%` }} />
                  </div>
                </td>
                <td className="px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums">{formatQuantity(p.meanAccel, 'm/s^2')}</td>
                <td className="px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums">{formatQuantity(p.maxAccel, 'm/s^2')}</td>
                <td className="px-3 py-2 text-right font-mono text-[13px] whitespace-nowrap tabular-nums">
                  {srp ? <span className="text-ink-soft">—</span> : p.srpToMeanRatio === null ? '—' : formatNumber(p.srpToMeanRatio)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="border-t border-rule px-3 py-2 text-xs text-ink-soft">
        Bars: time mean of |a| on a log scale; black tick: maximum. Ratio: SRP's mean acceleration divided by the force's.
      </p>
    </div>
  );
}
