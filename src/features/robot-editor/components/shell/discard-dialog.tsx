import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';

/** Throwing a draft away cannot be undone, so it is asked once. */
export function DiscardDialog({
  open,
  baseRevision,
  onClose,
  onDiscard,
}: {
  open: boolean;
  baseRevision: number;
  onClose: () => void;
  onDiscard: () => void;
}) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Discard the draft?"
      description={`Every unsaved change since r${baseRevision} is lost; this cannot be undone.`}
    >
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose} autoFocus>
          Keep the draft
        </Button>
        <Button variant="danger" onClick={onDiscard}>
          Discard the draft
        </Button>
      </div>
    </Dialog>
  );
}
