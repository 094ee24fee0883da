import { useId, useState } from 'react';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { errorMessage, isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import type { BootLineAnswer } from '@shared/schemas/boot-line';
import { useLookUpBootLine } from '../api/look-up-boot-line';

function Answer({ answer }: { answer: BootLineAnswer }) {
  const { match } = answer;
  const tone =
    match && answer.nameMatches
      ? match.isHead
        ? 'border-accent/40 bg-accent-soft'
        : 'border-warn/40 bg-warn-soft'
      : 'border-error/30 bg-error-soft';
  return (
    <div role="status" className={`space-y-1.5 rounded-md border px-3 py-2 ${tone}`}>
      <p className="font-semibold">{answer.verdict}</p>
      {match && (
        <p className="text-sm text-ink-soft">
          <span className="font-mono">r{match.number}</span> “{match.message}”, saved {formatDateTime(match.createdAt)}{' '}
          {match.isHead ? (
            <Badge tone="accent">head</Badge>
          ) : (
            <Badge tone="warn">behind head r{answer.headRevision}</Badge>
          )}
        </p>
      )}
      {answer.sameConfiguration.length > 0 && (
        <p className="text-sm text-ink-muted">
          Same configuration as {answer.sameConfiguration.map((n) => `r${n}`).join(', ')}.
        </p>
      )}
      <p className="font-mono text-xs text-ink-muted">
        read: {answer.parsed.device} “{answer.parsed.robotName}” revision {answer.parsed.revision} hash{' '}
        {answer.parsed.hash}
      </p>
    </div>
  );
}

/** Paste the line the robot prints at start-up; the answer says which revision it runs. */
export function BootLineBox({ robotId }: { robotId: string }) {
  const [line, setLine] = useState('');
  const lookUp = useLookUpBootLine(robotId);
  const id = useId();
  const fieldError = isApiError(lookUp.error)
    ? (lookUp.error.fields.line ?? errorMessage(lookUp.error))
    : lookUp.isError
      ? errorMessage(lookUp.error)
      : undefined;
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        lookUp.mutate(line);
      }}
    >
      <label htmlFor={id} className="block text-sm font-semibold text-ink-soft">
        Boot line from the serial monitor
      </label>
      <textarea
        id={id}
        value={line}
        onChange={(e) => setLine(e.target.value)}
        rows={3}
        spellCheck={false}
        placeholder={'boot robot="…" revision=3 hash=1a2b3c4d …'}
        aria-invalid={fieldError ? true : undefined}
        aria-describedby={fieldError ? `${id}-error` : undefined}
        className="block w-full rounded-md border border-rule-strong bg-paper-raised px-3 py-2 font-mono text-sm"
      />
      {fieldError && (
        <p id={`${id}-error`} className="text-sm font-semibold text-error">
          {fieldError}
        </p>
      )}
      <Button type="submit" variant="secondary" busy={lookUp.isPending} disabled={line.trim() === ''}>
        Which revision is this?
      </Button>
      {lookUp.data && <Answer answer={lookUp.data} />}
    </form>
  );
}
