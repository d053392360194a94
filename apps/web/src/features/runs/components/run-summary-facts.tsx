import type { RunSummary } from '@photon-ledger/shared';
import { formatNumber, formatQuantity } from '../lib/format-number';
import { formatDuration, formatUtc } from '../lib/format-time';

const vehicleKinds: Record<string, string> = {
  cannonball: 'cannonball',
  plates: 'flat plates',
  sail: 'solar sail',
  mesh: 'triangle mesh',
};

/** The key facts of a succeeded run: vehicle, span, sampling, frame, integrator and SRP acceleration. */
export function RunSummaryFacts({ summary }: { summary: RunSummary }) {
  const facts: Array<[string, string]> = [
    ['Vehicle', `${summary.vehicle.name} (${vehicleKinds[summary.vehicle.kind] ?? summary.vehicle.kind}, ${formatQuantity(summary.vehicle.massKg, 'kg', { digits: 4 })})`],
    ['Epoch', formatUtc(summary.epochUtc)],
    ['Span', `${formatDuration(summary.spanSeconds)} (${formatNumber(summary.spanSeconds / 86_400, { digits: 4 })} days)`],
    ['Output step', `${formatDuration(summary.outputStepSeconds)} · ${summary.sampleCount.toLocaleString('en-US')} samples`],
    ['Frame', `${summary.frame}, about the ${summary.centralBody === 'earth' ? 'Earth' : 'Sun'}`],
    ['Integrator', `${summary.integrator.steps.toLocaleString('en-US')} steps (${summary.integrator.rejected.toLocaleString('en-US')} rejected), ${formatDuration(summary.integrator.wallMs / 1000)} wall`],
    ['SRP |a| mean', formatQuantity(summary.srpAcceleration.mean, 'm/s^2')],
    ['SRP |a| max', formatQuantity(summary.srpAcceleration.max, 'm/s^2')],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-3 rounded-lg border border-rule bg-paper-raised p-4 text-sm sm:grid-cols-2 lg:grid-cols-4">
      {facts.map(([term, value]) => (
        <div key={term} className="min-w-0">
          <dt className="text-xs text-ink-soft">{term}</dt>
          <dd className="break-words text-ink tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Same size as RunSummaryFacts, while the summary loads. */
export function RunSummaryFactsSkeleton() {
  return (
    <div role="status" className="grid gap-x-6 gap-y-3 rounded-lg border border-rule bg-paper-raised p-4 sm:grid-cols-2 lg:grid-cols-4">
      {Array.from({ length: 8 }, (_, i) => (
        <div key={i} className="flex flex-col gap-1">
          <span className="h-3 w-16 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
          <span className="h-4 w-40 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" />
        </div>
      ))}
      <span className="sr-only">Loading the run summary…</span>
    </div>
  );
}
