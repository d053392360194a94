/** `/api/missions/:missionId/studies[/:studyId]`, ids encoded. */
export function studiesPath(missionId: string): string {
  return `/api/missions/${encodeURIComponent(missionId)}/studies`;
}

export function studyPath(missionId: string, studyId: string): string {
  return `${studiesPath(missionId)}/${encodeURIComponent(studyId)}`;
}

/** The web page of a study. */
export function studyPagePath(missionId: string, studyId: string): string {
  return `/missions/${encodeURIComponent(missionId)}/studies/${encodeURIComponent(studyId)}`;
}

/** Milliseconds between refreshes of a study that still has cases to compute. */
export const STUDY_POLL_MS = 1000;
