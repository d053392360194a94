/** `/missions/:missionId/vehicles/:vehicleId/history — revisions of a vehicle, and what changed between two. */
export function VehicleHistoryRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
