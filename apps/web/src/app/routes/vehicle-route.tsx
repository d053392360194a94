/** `/missions/:missionId/vehicles/:vehicleId — the vehicle editor with its live 3D preview; saving makes a new revision. */
export function VehicleRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
