import { Link } from 'react-router-dom';
import type { Run } from '@photon-ledger/shared';
import { useRunBudget } from '../api/get-run-budget';
import { runPagePath } from '../api/run-path';
import { formatDuration, formatUtc, secondsBetween } from '../lib/format-time';
import { RunProgressBar } from './run-progress-bar';
import { RunStatusBadge } from './run-status-badge';

/** Props of RunList. */
export interface RunListProps {
  missionId: string;
  /** Newest first, as the API lists them. */
  runs: readonly Run[];
  /** Hides the scenario column (on a scenario's own page). */
  hideScenario?: boolean;
}

/** A mission's runs as a table: when, which scenario, state, progress, duration and budget counts; each links to its run page. */
export function RunList({ missionId, runs, hideScenario = false }: RunListProps) {
  if (runs.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
        No runs yet. Start a run from a scenario to compute its SRP budget.
      </p>
    );
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full min-w-[40rem] text-left text-sm">
        <caption className="sr-only">Runs, newest first</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Started (UTC)
            </th>
            {!hideScenario && (
              <th scope="col" className="px-3 py-2 font-medium">
                Scenario
              </th>
            )}
            <th scope="col" className="px-3 py-2 font-medium">
              Status
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Duration
            </th>
            <th scope="col" className="px-3 py-2 font-medium">
              Budget
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {runs.map((run) => (
            <RunRow key={run.id} missionId={missionId} run={run} hideScenario={hideScenario} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

function RunRow({ missionId, run, hideScenario }: { missionId: string; run: Run; hideScenario: boolean }) {
  const active = run.status === 'queued' || run.status === 'running';
  const when = run.startedAt ?? run.queuedAt;
  const seconds = secondsBetween(run.startedAt, run.finishedAt);
  return (
    <tr className="h-12 align-middle hover:bg-white">
      <td className="px-3 py-2 whitespace-nowrap">
        <Link
          to={runPagePath(missionId, run.id)}
          className="font-mono text-xs text-ink underline decoration-rule-strong underline-offset-2 hover:text-sodium-deep"
        >
          <time dateTime={when}>{formatUtc(when, { seconds: false }).replace(' UTC', '')}</time>
          <span className="sr-only">: open run of {run.scenarioName}</span>
        </Link>
      </td>
      {!hideScenario && <td className="max-w-[16rem] truncate px-3 py-2">{run.scenarioName}</td>}
      <td className="px-3 py-2">
        <div className="flex w-44 flex-col items-start gap-1">
          <RunStatusBadge status={run.status} />
          {active && (
            <RunProgressBar
              className="w-full"
              progress={run.progress}
              waiting={run.status === 'queued'}
              showText={run.status === 'running'}
              label={`Progress of the run of ${run.scenarioName}`}
            />
          )}
        </div>
      </td>
      <td className="px-3 py-2 font-mono text-xs whitespace-nowrap text-ink-soft">
        {seconds === null ? '—' : formatDuration(seconds)}
        {run.status === 'running' && <span className="sr-only"> so far</span>}
      </td>
      <td className="px-3 py-2">
        {run.status === 'succeeded' ? <BudgetCounts missionId={missionId} runId={run.id} /> : <span className="text-ink-soft">—</span>}
      </td>
    </tr>
  );
}

function BudgetCounts({ missionId, runId }: { missionId: string; runId: string }) {
  const budget = useRunBudget(missionId, runId);
  if (budget.isPending) {
    return (
      <span className="inline-block h-4 w-36 animate-pulse rounded bg-paper-sunk motion-reduce:animate-none" role="status">
        <span className="sr-only">Loading budget…</span>
      </span>
    );
  }
  if (budget.isError) return <span className="text-xs text-alarm">Budget unavailable</span>;
  const { counts } = budget.data;
  return (
    <span className="flex flex-wrap gap-x-2 font-mono text-xs whitespace-nowrap">
      <span className="text-sage-deep">{counts.pass} pass</span>
      <span className={counts.fail > 0 ? 'font-semibold text-alarm' : 'text-ink-soft'}>{counts.fail} fail</span>
      <span className="text-ink-soft">{counts.noRequirement} no req.</span>
      {counts.noValue > 0 && <span className="text-ink-soft">{counts.noValue} no value</span>}
    </span>
  );
}
