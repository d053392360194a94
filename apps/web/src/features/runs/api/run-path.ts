/** `/api/missions/:missionId/runs/:runId`, with both ids encoded. */
export function runPath(missionId: string, runId: string): string {
  return `/api/missions/${encodeURIComponent(missionId)}/runs/${encodeURIComponent(runId)}`;
}

/** The web page of a run. */
export function runPagePath(missionId: string, runId: string): string {
  return `/missions/${encodeURIComponent(missionId)}/runs/${encodeURIComponent(runId)}`;
}
