import { useMutation, useQueryClient } from '@tanstack/react-query';
import { studySchema, type Study } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studyPath } from './study-path';

/** `POST .../studies/:studyId/cancel`: queued cases at once, running ones within about a second. */
export function cancelStudy(missionId: string, studyId: string): Promise<Study> {
  return apiRequest(`${studyPath(missionId, studyId)}/cancel`, studySchema, { method: 'POST' });
}

export function useCancelStudy(missionId: string, studyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelStudy(missionId, studyId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: studyKeyPrefix(missionId) }),
  });
}
