/**
 * Navigation state of the move to the sign-in page after signing out. Pages that ask before
 * leaving (unsaved work) let it through: the person already chose to sign out, and their drafts
 * were dealt with before.
 */
export const SIGNED_OUT_STATE = { signedOut: true } as const;

export function isSignOutNavigation(state: unknown): boolean {
  return typeof state === 'object' && state !== null && (state as { signedOut?: unknown }).signedOut === true;
}
