import type { PasswordResetRequestInput } from '@mixmark/common';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Always 202: the reply does not tell whether the address has an account. */
export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  await api.post('/auth/password-reset/request', input);
}

export function useRequestPasswordReset({ onSuccess }: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: requestPasswordReset, onSuccess });
}
