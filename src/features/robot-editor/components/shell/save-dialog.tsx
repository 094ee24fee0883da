import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { settingChanges, type SettingChange } from '@shared/history/setting-changes';
import { RevisionMessageSchema } from '@shared/schemas/robots';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { ChangeList } from './change-list';

const SaveFormSchema = z.object({ message: RevisionMessageSchema });
type SaveForm = z.input<typeof SaveFormSchema>;

export interface SaveDialogProps {
  open: boolean;
  onClose: () => void;
  /** The message to start with (a suggestion, or what was typed before a conflict). */
  initialMessage: string;
  baseRevision: number;
  baseConfig: RobotConfig | null;
  draft: RobotConfig;
  /** Number of fields the schema refuses; saving waits until there are none. */
  invalidFields: number;
  saving: boolean;
  /** The save's error, when it failed for a reason other than a newer revision. */
  error: string | null;
  onSubmit: (message: string) => void;
}

/** Review what changed, say why in a sentence, and save it as the next revision. */
export function SaveDialog({
  open,
  onClose,
  initialMessage,
  baseRevision,
  baseConfig,
  draft,
  invalidFields,
  saving,
  error,
  onSubmit,
}: SaveDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      busy={saving}
      title="Save a new revision"
      size="max-w-2xl"
      description={`On top of r${baseRevision}. Everyone in the team sees it.`}
    >
      {open && (
        <SaveForm
          initialMessage={initialMessage}
          changes={baseConfig ? settingChanges(baseConfig, draft) : null}
          baseRevision={baseRevision}
          invalidFields={invalidFields}
          saving={saving}
          error={error}
          onSubmit={onSubmit}
          onCancel={onClose}
        />
      )}
    </Dialog>
  );
}

function SaveForm({
  initialMessage,
  changes,
  baseRevision,
  invalidFields,
  saving,
  error,
  onSubmit,
  onCancel,
}: Pick<SaveDialogProps, 'initialMessage' | 'baseRevision' | 'invalidFields' | 'saving' | 'error' | 'onSubmit'> & {
  changes: SettingChange[] | null;
  onCancel: () => void;
}) {
  const form = useForm<SaveForm>({ resolver: zodResolver(SaveFormSchema), defaultValues: { message: initialMessage } });
  const submit = form.handleSubmit((values) => onSubmit(values.message.trim()));
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <section aria-label="Changes in this revision">
        <h3 className="mb-1 text-sm font-semibold text-ink-soft">Changes since r{baseRevision}</h3>
        {changes ? (
          <ChangeList changes={changes} limit={12} />
        ) : (
          <p className="text-sm text-ink-muted">
            This draft started from r{baseRevision}; a newer revision exists, so saving will ask how to combine them.
          </p>
        )}
      </section>
      {invalidFields > 0 && (
        <FormError
          message={`${invalidFields} ${invalidFields === 1 ? 'field needs' : 'fields need'} fixing before this can be saved: see “All problems”.`}
        />
      )}
      <FormError message={error ?? undefined} />
      <TextField
        label="What changed, and why?"
        hint="A short sentence; it appears in the robot's history."
        autoFocus
        autoComplete="off"
        error={form.formState.errors.message?.message}
        {...form.register('message')}
      />
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={saving}>
          Keep editing
        </Button>
        <Button type="submit" busy={saving} disabled={invalidFields > 0}>
          Save revision
        </Button>
      </div>
    </form>
  );
}
