import { useMutation, useQueryClient } from '@tanstack/react-query';
import { attitudeProfileUploadResultSchema, type AttitudeProfileUploadResult } from '@photon-ledger/shared';
import { apiRequest } from '../../../lib/api-client';
import { attitudeProfilesQueryOptions } from './list-attitude-profiles';

/**
 * `POST /api/missions/:missionId/uploads/attitude-profile`: an attitude-profile CSV as
 * multipart/form-data (field `file`); 201 with the upload, whose id is a tabulated law's
 * `profileId`. A bad file is refused (400) with the line and column in the message.
 */
export async function uploadAttitudeProfile(missionId: string, file: File): Promise<AttitudeProfileUploadResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  return apiRequest(`/api/missions/${encodeURIComponent(missionId)}/uploads/attitude-profile`, attitudeProfileUploadResultSchema, {
    method: 'POST',
    body: form,
  });
}

/** Uploads an attitude profile and refreshes the mission's profile list. */
export function useUploadAttitudeProfile(missionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadAttitudeProfile(missionId, file),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: attitudeProfilesQueryOptions(missionId).queryKey });
    },
  });
}
