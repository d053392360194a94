import { useMutation, useQueryClient } from '@tanstack/react-query';
import { studySchema, type Study, type StudyCreate } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { studyKeyPrefix } from './list-studies';
import { studiesPath } from './study-path';

/** `POST /api/missions/:missionId/studies`: defines a study and queues its cases. */
export function createStudy(missionId: string, body: StudyCreate): Promise<Study> {
  return apiRequest(studiesPath(missionId), studySchema, { method: 'POST', body });
}

export function useCreateStudy(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: StudyCreate) => createStudy(missionId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: studyKeyPrefix(missionId) }),
  });
}
