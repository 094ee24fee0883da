import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { CurrentUser, SignInInput } from '@shared/schemas/auth';
import { authKeys } from './auth-keys';

export function signIn(input: SignInInput): Promise<{ user: CurrentUser }> {
  return apiRequest('/auth/sign-in', { method: 'POST', body: input });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: ({ user }) => {
      // Whatever was cached belonged to whoever was signed in before.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
