import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { CurrentUser, SignUpInput } from '@shared/schemas/auth';
import { authKeys } from './auth-keys';

export function signUp(input: SignUpInput): Promise<{ user: CurrentUser }> {
  return apiRequest('/auth/sign-up', { method: 'POST', body: input });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: ({ user }) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
