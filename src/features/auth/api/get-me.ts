import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest, isApiError } from '@/lib/api-client';
import type { CurrentUser } from '@shared/schemas/auth';
import { authKeys } from './auth-keys';

/** The signed-in person, or null when nobody is signed in. */
export async function getMe(): Promise<CurrentUser | null> {
  try {
    const { user } = await apiRequest<{ user: CurrentUser }>('/auth/me');
    return user;
  } catch (error) {
    if (isApiError(error, 401)) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
