import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { PasswordResetRequest } from '@shared/schemas/auth';

export function requestPasswordReset(input: PasswordResetRequest): Promise<{ message: string }> {
  return apiRequest('/auth/password-reset', { method: 'POST', body: input });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
