import { useEffect } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { isSignOutNavigation } from '@/lib/sign-out-navigation';

/**
 * Asks before leaving the robot with unsaved changes: inside the app with a dialog, and when
 * the tab closes or reloads with the browser's own question. Moving between the robot's
 * sections (paths under `basePath`) never asks, and neither does signing out, which warns
 * about unsaved drafts itself.
 */
export function LeaveGuard({
  dirty,
  basePath,
  onDiscard,
}: {
  dirty: boolean;
  basePath: string;
  onDiscard: () => void;
}) {
  const blocker = useBlocker(
    ({ nextLocation }) =>
      dirty &&
      !isSignOutNavigation(nextLocation.state) &&
      !nextLocation.pathname.startsWith(`${basePath}/`) &&
      nextLocation.pathname !== basePath,
  );

  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the question only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const blocked = blocker.state === 'blocked';
  return (
    <Dialog
      open={blocked}
      onClose={() => blocker.reset?.()}
      title="Leave with unsaved changes?"
      description="Your draft stays on this computer and is here when you come back, but nobody else sees it until you save."
    >
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={() => blocker.reset?.()}>
          Stay
        </Button>
        <Button
          variant="danger"
          onClick={() => {
            onDiscard();
            blocker.proceed?.();
          }}
        >
          Discard the draft and leave
        </Button>
        <Button onClick={() => blocker.proceed?.()} autoFocus>
          Leave, keep the draft
        </Button>
      </div>
    </Dialog>
  );
}
