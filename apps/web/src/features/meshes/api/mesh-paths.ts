/** API path of a mission's meshes. */
export function meshesApiPath(missionId: string): string {
  return `/api/missions/${encodeURIComponent(missionId)}/meshes`;
}

/** API path of one mesh. */
export function meshApiPath(missionId: string, meshId: string): string {
  return `${meshesApiPath(missionId)}/${encodeURIComponent(meshId)}`;
}

/** API path of one coefficient table. */
export function coefficientTableApiPath(missionId: string, tableId: string): string {
  return `/api/missions/${encodeURIComponent(missionId)}/coefficient-tables/${encodeURIComponent(tableId)}`;
}

/** Page of a mission's meshes. */
export function meshesPagePath(missionId: string): string {
  return `/missions/${missionId}/meshes`;
}

/** Page of one mesh. */
export function meshPagePath(missionId: string, meshId: string): string {
  return `/missions/${missionId}/meshes/${meshId}`;
}
