import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Panel } from '@/components/ui/panel';
import { TextAreaField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { BootLineInputSchema, type TeamBootLineAnswer } from '@shared/schemas/boot-line';
import { useLookUpTeamBootLine } from '../api/look-up-team-boot-line';

type Values = z.input<typeof BootLineInputSchema>;

const historyPath = (teamId: string, robotId: string) =>
  `/teams/${encodeURIComponent(teamId)}/robots/${encodeURIComponent(robotId)}/history`;
const linkClasses = 'font-semibold text-accent-strong underline underline-offset-2 hover:no-underline';

function RevisionLine({ answer }: { answer: NonNullable<TeamBootLineAnswer['answer']> }) {
  if (!answer.match)
    return <p className="text-sm font-semibold text-error-strong">No saved revision has this configuration.</p>;
  return (
    <p className="flex flex-wrap items-center gap-1.5 text-sm">
      <span className="font-mono font-semibold">revision {answer.match.number}</span>
      {answer.match.isHead ? (
        <Badge tone="accent">head</Badge>
      ) : (
        <Badge tone="warn">behind head r{answer.headRevision}</Badge>
      )}
    </p>
  );
}

function Answer({ teamId, result }: { teamId: string; result: TeamBootLineAnswer }) {
  const { robot, answer } = result;
  if (!robot || !answer) {
    return (
      <div
        role="status"
        className="rounded-md border border-error/30 bg-error-soft px-3 py-2 text-sm text-error-strong"
      >
        {result.verdict}
      </div>
    );
  }
  const settled = answer.match && answer.nameMatches;
  const tone = settled
    ? answer.match!.isHead
      ? 'border-accent/40 bg-accent-soft'
      : 'border-warn/40 bg-warn-soft'
    : 'border-error/30 bg-error-soft';
  return (
    <div role="status" className={`space-y-1.5 rounded-md border px-3 py-2 ${tone}`}>
      <p className="text-xs font-semibold tracking-wide text-ink-muted uppercase">
        {result.foundBy === 'hash' ? 'Found by configuration hash' : 'Found by name only'}
      </p>
      <p>
        <Link to={historyPath(teamId, robot.id)} className={linkClasses}>
          {robot.name}
          <span className="sr-only"> — history</span>
          <span aria-hidden="true"> →</span>
        </Link>
      </p>
      <RevisionLine answer={answer} />
      {result.foundBy === 'name' && <p className="text-sm text-ink-soft">{result.verdict}</p>}
      <p className="text-sm text-ink-soft">{answer.verdict}</p>
      {result.otherRobots.length > 0 && (
        <p className="text-sm text-ink-muted">
          Same configuration also on{' '}
          {result.otherRobots.map((other, i) => (
            <span key={other.id}>
              {i > 0 && ', '}
              <Link to={historyPath(teamId, other.id)} className={linkClasses}>
                {other.name}
              </Link>
            </span>
          ))}
          .
        </p>
      )}
    </div>
  );
}

/** For someone plugged into one of the team's robots: paste its boot line, learn which robot it is. */
export function WhichRobotPanel({ teamId }: { teamId: string }) {
  const lookUp = useLookUpTeamBootLine(teamId);
  const form = useForm<Values, unknown, z.output<typeof BootLineInputSchema>>({
    resolver: zodResolver(BootLineInputSchema),
    defaultValues: { line: '' },
  });
  const { errors } = form.formState;

  const onSubmit = submitWithServerErrors(form, ['line'], (values) => lookUp.mutateAsync(values));

  return (
    <Panel
      title="Which robot is this?"
      titleId="which-robot-title"
      description="Paste the line a robot prints on the serial monitor at start-up."
    >
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
        <FormError message={errors.root?.server?.message} />
        <TextAreaField
          label="Boot line"
          rows={4}
          spellCheck={false}
          placeholder={'boot robot="…" revision=3 hash=1a2b3c4d …'}
          className="[&_textarea]:font-mono [&_textarea]:text-sm"
          error={errors.line?.message}
          {...form.register('line')}
        />
        <Button type="submit" variant="secondary" busy={lookUp.isPending} className="self-start">
          Find the robot
        </Button>
        {lookUp.data && <Answer teamId={teamId} result={lookUp.data} />}
      </form>
    </Panel>
  );
}
