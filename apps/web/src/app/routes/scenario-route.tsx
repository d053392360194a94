/** `/missions/:missionId/scenarios/:scenarioId — a scenario: its set-up, its runs, start a run. */
export function ScenarioRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
