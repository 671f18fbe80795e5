import type { PasswordResetInput } from '@mixmark/common';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export async function resetPassword(input: PasswordResetInput): Promise<void> {
  await api.post('/auth/password-reset', input);
}

export function useResetPassword({ onSuccess }: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: resetPassword, onSuccess });
}
