/** `/missions/:missionId/runs/:runId — a run: live progress, then charts, events, budget, exports and 3D playback. */
export function RunRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
