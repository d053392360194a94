/** `/missions/:missionId/requirements — the mission's requirements on budget lines (leads edit). */
export function RequirementsRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
