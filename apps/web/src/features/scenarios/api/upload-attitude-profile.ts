import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  apiErrorSchema,
  attitudeProfileUploadResultSchema,
  type AttitudeProfileUploadResult,
} from '@photon-ledger/shared';
import { ApiRequestError } from '../../../lib/api-client';
import { attitudeProfilesQueryOptions } from './list-attitude-profiles';

/**
 * `POST /api/missions/:missionId/uploads/attitude-profile`: an attitude-profile CSV as
 * multipart/form-data (field `file`); 201 with the upload, whose id is a tabulated law's
 * `profileId`. A bad file is refused (400) with the line and column in the message.
 */
export async function uploadAttitudeProfile(missionId: string, file: File): Promise<AttitudeProfileUploadResult> {
  const form = new FormData();
  form.append('file', file, file.name);
  let response: Response;
  try {
    response = await fetch(`/api/missions/${encodeURIComponent(missionId)}/uploads/attitude-profile`, {
      method: 'POST',
      headers: { Accept: 'application/json' },
      body: form,
      credentials: 'include',
    });
  } catch (cause) {
    throw new ApiRequestError({
      status: 0,
      code: 'network_error',
      message: 'Could not reach the Photon Ledger server. Check your connection and try again.',
      cause,
    });
  }
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const error = apiErrorSchema.safeParse(body);
    throw new ApiRequestError(
      error.success
        ? { status: response.status, ...error.data.error }
        : { status: response.status, code: 'unexpected_response', message: `The server answered ${response.status}.` },
    );
  }
  const parsed = attitudeProfileUploadResultSchema.safeParse(body);
  if (!parsed.success) {
    throw new ApiRequestError({
      status: response.status,
      code: 'unexpected_response',
      message: 'The server’s answer to the upload was not understood.',
    });
  }
  return parsed.data;
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
