import type { ProfileUpdate } from '@mixmark/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { authStore, type SessionUser } from '@/lib/auth-store';
import type { Profile } from '../types';
import { getProfileQueryOptions } from './get-profile';

/** `PATCH /api/auth/me`, checked there by the same `profileUpdateSchema`; answers as `GET me`. */
export async function updateProfile(input: ProfileUpdate): Promise<Profile> {
  const { data } = await api.patch<Profile>('/auth/me', input);
  return data;
}

export function useUpdateProfile({ onSuccess }: { onSuccess?: (profile: Profile) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProfile,
    onSuccess: (profile) => {
      queryClient.setQueryData(getProfileQueryOptions().queryKey, profile);
      // The top bar shows the name from the session: give it the new one.
      const { weeklyDigest: _digest, ...user } = profile;
      authStore.updateUser(user as SessionUser);
      onSuccess?.(profile);
    },
  });
}
