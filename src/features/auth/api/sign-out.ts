import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

export function signOut(): Promise<void> {
  return apiRequest('/auth/sign-out', { method: 'POST' });
}

/**
 * Ends the session on the server. What the browser still holds (cached answers, drafts) is
 * forgotten by the caller once it has left the signed-in pages, so those pages do not ask the
 * server again, get 401 and strand the person on an error.
 */
export function useSignOut() {
  return useMutation({ mutationFn: signOut });
}
