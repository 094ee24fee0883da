import { useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import type { VerifyResult } from '@shared/schemas/firmware';
import { firmwareKeys } from './firmware-keys';

/** Compiles a saved revision's sketches on the server (cached there by content). */
export function verifyRevision(robotId: string, revision: number): Promise<VerifyResult> {
  return apiRequest<VerifyResult>(`/robots/${encodeURIComponent(robotId)}/revisions/${revision}/verify`, {
    method: 'POST',
  });
}

/**
 * The compile check of a revision: runs only when asked (`check()`), and the answer stays for
 * the session, so leaving the section and coming back keeps it on screen.
 */
export function useVerifyRevision(robotId: string, revision: number) {
  const query = useQuery({
    queryKey: firmwareKeys.verify(robotId, revision),
    queryFn: () => verifyRevision(robotId, revision),
    enabled: false,
    staleTime: Infinity,
    gcTime: 30 * 60_000,
    retry: false,
  });
  return { ...query, check: () => query.refetch() };
}
