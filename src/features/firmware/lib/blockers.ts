import type { FirmwareBlocker } from '@shared/schemas/firmware';
import { isApiError } from '@/lib/api-client';

function isBlocker(value: unknown): value is FirmwareBlocker {
  const v = value as FirmwareBlocker;
  return typeof v?.message === 'string' && Array.isArray(v.path);
}

/**
 * The reasons in an answer that refused to render firmware: a 422 lists what blocks generation
 * (exact paths); a 400 names the draft's invalid fields (`config.`-prefixed dotted paths).
 * Null for any other error.
 */
export function blockersOf(error: unknown): FirmwareBlocker[] | null {
  if (!isApiError(error)) return null;
  if (error.status === 422 && error.code === 'firmware_blocked') {
    const issues = Array.isArray(error.details.issues) ? error.details.issues.filter(isBlocker) : [];
    return issues.length > 0
      ? issues
      : Object.entries(error.fields).map(([key, message]) => ({ path: key.split('.'), message }));
  }
  if (error.status === 400 && Object.keys(error.fields).length > 0) {
    return Object.entries(error.fields).map(([key, message]) => ({
      path: key.replace(/^config\./, '').split('.'),
      message,
    }));
  }
  return null;
}
