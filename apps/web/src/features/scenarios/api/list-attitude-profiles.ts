import { queryOptions, useQuery } from '@tanstack/react-query';
import { uploadListSchema, type UploadList } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';

/** `GET /api/missions/:missionId/uploads?kind=attitude-profile`: the mission's attitude profiles, newest first. */
export function listAttitudeProfiles(missionId: string, signal?: AbortSignal): Promise<UploadList> {
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/uploads`, uploadListSchema, {
    query: { kind: 'attitude-profile' },
    signal,
  });
}

/** Query options of the attitude-profile list; the only place its key is written. */
export function attitudeProfilesQueryOptions(missionId: string) {
  return queryOptions({
    queryKey: ['missions', missionId, 'uploads', 'list', 'attitude-profile'] as const,
    queryFn: ({ signal }) => listAttitudeProfiles(missionId, signal),
  });
}

/** The attitude profiles uploaded to a mission; pass `enabled: false` until a tabulated law is chosen. */
export function useAttitudeProfiles(missionId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...attitudeProfilesQueryOptions(missionId), enabled });
}
