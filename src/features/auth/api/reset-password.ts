import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { CurrentUser, PasswordResetInput } from '@shared/schemas/auth';
import { authKeys } from './auth-keys';

export function resetPassword(input: PasswordResetInput): Promise<{ user: CurrentUser }> {
  return apiRequest('/auth/password-reset/confirm', { method: 'POST', body: input });
}

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    onSuccess: ({ user }) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
