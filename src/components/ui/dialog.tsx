import { useEffect, useId, useRef, type ReactNode } from 'react';
import { cx } from './cx';

export interface DialogProps {
  open: boolean;
  /** Called for Escape, the close button and a click on the backdrop. */
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Width class, e.g. `max-w-lg`. */
  size?: string;
  /** Keep it open on Escape and backdrop clicks (while work is under way). */
  busy?: boolean;
}

/**
 * A modal sheet on the native <dialog>: the browser keeps focus inside, Escape closes it, and
 * focus returns to what opened it.
 */
export function Dialog({ open, onClose, title, description, children, size = 'max-w-lg', busy = false }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      aria-describedby={description ? `${id}-description` : undefined}
      onCancel={(event) => {
        event.preventDefault();
        if (!busy) onClose();
      }}
      onClick={(event) => {
        if (event.target === ref.current && !busy) onClose();
      }}
      className={cx(
        'm-auto w-[calc(100%-2rem)] rounded-lg border border-rule bg-paper-raised p-0 text-ink shadow-xl backdrop:bg-ink/40',
        size,
      )}
    >
      {open && (
        <div className="flex max-h-[85vh] flex-col">
          <header className="flex items-start justify-between gap-4 border-b border-rule px-5 py-4">
            <div>
              <h2 id={`${id}-title`} className="text-lg font-semibold">
                {title}
              </h2>
              {description && (
                <p id={`${id}-description`} className="mt-0.5 text-sm text-ink-muted">
                  {description}
                </p>
              )}
            </div>
            <button
              type="button"
              onClick={onClose}
              disabled={busy}
              aria-label="Close"
              className="rounded px-2 text-xl leading-none text-ink-muted hover:text-ink disabled:opacity-50"
            >
              ×
            </button>
          </header>
          <div className="overflow-y-auto px-5 py-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
