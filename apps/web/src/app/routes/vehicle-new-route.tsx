/** `/missions/:missionId/vehicles/new — a new vehicle (plates, cannonball or sail) with its live 3D preview. */
export function VehicleNewRoute() {
  return <p className="text-sm text-ink-soft">This page is being built.</p>;
}
