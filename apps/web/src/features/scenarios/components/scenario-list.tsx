import { useQueries } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { ScenarioListItem } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { scenarioQueryOptions } from '../api/get-scenario';
import { orbitSummary, spanSummary } from '../lib/orbit-summary';

/** Props of ScenarioList. */
export interface ScenarioListProps {
  missionId: string;
  scenarios: readonly ScenarioListItem[];
}

/**
 * The mission's scenarios as a table: name (a link to its set-up), vehicle and revision, orbit,
 * span, runs and last change. The orbit comes from each scenario's spec, loaded beside the list.
 */
export function ScenarioList({ missionId, scenarios }: ScenarioListProps) {
  const details = useQueries({ queries: scenarios.map((s) => scenarioQueryOptions(missionId, s.id)) });
  if (scenarios.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
        No scenarios yet. A scenario sets a vehicle on an orbit with the forces and attitude to budget.
      </p>
    );
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full min-w-[44rem] text-left text-sm">
        <caption className="sr-only">Scenarios, by name</caption>
        <thead className="border-b border-rule text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Name</th>
            <th scope="col" className="px-3 py-2 font-medium">Vehicle</th>
            <th scope="col" className="px-3 py-2 font-medium">Initial orbit</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Span</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Runs</th>
            <th scope="col" className="px-3 py-2 font-medium">Updated</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {scenarios.map((scenario, index) => {
            const spec = details[index]?.data?.spec;
            return (
              <tr key={scenario.id} className="h-10 hover:bg-white">
                <th scope="row" className="px-3 py-2 font-medium">
                  <Link
                    to={`/missions/${missionId}/scenarios/${scenario.id}`}
                    className="underline-offset-2 hover:text-sodium-deep hover:underline"
                  >
                    {scenario.name}
                  </Link>
                </th>
                <td className="px-3 py-2">
                  {scenario.vehicle.name} <span className="font-mono text-xs text-ink-soft">rev. {scenario.vehicle.revision}</span>
                </td>
                <td className="px-3 py-2 font-mono text-xs whitespace-nowrap">
                  {spec ? (
                    orbitSummary(spec.orbit)
                  ) : (
                    <span aria-hidden="true" className="inline-block h-3 w-40 animate-pulse rounded bg-paper-sunk align-middle motion-reduce:animate-none" />
                  )}
                </td>
                <td className="px-3 py-2 text-right font-mono text-xs whitespace-nowrap">{spanSummary(scenario.spanDays)}</td>
                <td className="px-3 py-2 text-right font-mono text-xs">{scenario.runCount}</td>
                <td className="px-3 py-2 font-mono text-xs whitespace-nowrap">
                  <time dateTime={scenario.updatedAt}>{formatUtcDate(scenario.updatedAt)}</time>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
