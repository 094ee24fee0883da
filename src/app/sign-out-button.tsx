import { useQueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useNavigate } from 'react-router';
import { Button, type ButtonProps } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormError } from '@/components/ui/form-error';
import { authKeys } from '@/features/auth/api/auth-keys';
import { useMe } from '@/features/auth/api/get-me';
import { useSignOut } from '@/features/auth/api/sign-out';
import {
  browserDraftStorage,
  clearDraftsOnSignOut,
  listUnsavedDrafts,
  type UnsavedDraft,
} from '@/features/robot-editor/lib/draft-storage';
import { errorMessage, isApiError } from '@/lib/api-client';
import { SIGNED_OUT_STATE } from '@/lib/sign-out-navigation';

interface SignOutButtonProps extends Omit<ButtonProps, 'onClick' | 'busy' | 'children'> {
  /** Where to go once signed out (a sign-in page). */
  to?: string;
  children?: ReactNode;
}

/**
 * Signs out on a computer others may use next: warns first when this person has unsaved drafts
 * here, removes their drafts, goes to the sign-in page, and only then forgets the cached answers
 * (so the page being left does not ask the server again and strand the person on an error).
 */
export function SignOutButton({ to = '/sign-in', children = 'Sign out', ...buttonProps }: SignOutButtonProps) {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [unsaved, setUnsaved] = useState<UnsavedDraft[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const storage = browserDraftStorage();
  const userId = me.data?.id;

  const finish = async () => {
    try {
      await signOut.mutateAsync();
    } catch (failure) {
      // A session that already ended is as good as signed out; anything else keeps them in.
      if (!isApiError(failure, 401)) {
        setError(`Could not sign out: ${errorMessage(failure)}`);
        return;
      }
    }
    if (userId && storage) clearDraftsOnSignOut(storage, userId);
    setUnsaved(null);
    queryClient.setQueryData(authKeys.me(), null);
    await navigate(to, { replace: true, state: SIGNED_OUT_STATE });
    queryClient.clear();
    queryClient.setQueryData(authKeys.me(), null);
  };

  const start = () => {
    setError(null);
    const drafts = userId && storage ? listUnsavedDrafts(storage, userId) : [];
    if (drafts.length > 0) setUnsaved(drafts);
    else void finish();
  };

  const count = unsaved?.length ?? 0;
  return (
    <>
      <Button {...buttonProps} busy={signOut.isPending} onClick={start}>
        {children}
      </Button>
      <Dialog
        open={unsaved !== null || error !== null}
        onClose={() => {
          setUnsaved(null);
          setError(null);
        }}
        busy={signOut.isPending}
        title={error ? 'Still signed in' : 'Sign out and delete unsaved drafts?'}
        description={
          error
            ? undefined
            : `You have unsaved changes to ${count === 1 ? 'one robot' : `${count} robots`} in this browser. Signing out deletes them, so the next person here cannot see or save them. Save first to keep them.`
        }
      >
        <FormError message={error ?? undefined} className="mb-3" />
        {unsaved && (
          <ul className="mb-4 list-disc pl-5 text-sm">
            {unsaved.map((draft) => (
              <li key={draft.robotId}>{draft.robotName}</li>
            ))}
          </ul>
        )}
        <div className="flex flex-wrap justify-end gap-2">
          <Button
            variant="secondary"
            autoFocus
            onClick={() => {
              setUnsaved(null);
              setError(null);
            }}
          >
            Stay signed in
          </Button>
          {unsaved && (
            <Button variant="danger" busy={signOut.isPending} onClick={() => void finish()}>
              Delete the drafts and sign out
            </Button>
          )}
        </div>
      </Dialog>
    </>
  );
}
