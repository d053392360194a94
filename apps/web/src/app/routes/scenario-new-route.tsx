/** `/missions/:missionId/scenarios/new — set up a scenario. */
export function ScenarioNewRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
