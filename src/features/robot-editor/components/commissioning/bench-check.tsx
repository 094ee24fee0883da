import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { FormError, FormNotice } from '@/components/ui/form-error';
import { applyFindings, benchTestSteps, type BenchFinding } from '@shared/commissioning/commissioning';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { BenchStepCard } from './bench-step-card';

export interface BenchCheckProps {
  /** The draft the check is about (valid). */
  config: RobotConfig;
  canEdit: boolean;
  /** Puts the fixed configuration into the draft. */
  onApply: (config: RobotConfig) => void;
  /** Opens the save dialog with this message. */
  onSave?: (message: string) => void;
}

type Answers = Record<string, Partial<BenchFinding>>;

const complete = (f: Partial<BenchFinding> | undefined): f is BenchFinding =>
  f !== undefined && f.turned !== undefined && (f.turned === null || f.direction !== undefined);

function statusWords(
  motor: string,
  f: Partial<BenchFinding> | undefined,
): { text: string; tone: 'muted' | 'ok' | 'fix' | 'bad' } {
  if (!complete(f)) return { text: 'not checked yet', tone: 'muted' };
  if (f.turned === null) return { text: 'nothing turned', tone: 'bad' };
  const parts = [f.turned !== motor && `turned ${f.turned}`, f.direction === 'opposite' && 'wrong way'].filter(Boolean);
  return parts.length ? { text: parts.join(', '), tone: 'fix' } : { text: 'as expected', tone: 'ok' };
}

/** The guided wheels-up check, one motor at a time in bench-test order, then the fix. */
export function BenchCheck({ config, canEdit, onApply, onSave }: BenchCheckProps) {
  const steps = useMemo(() => benchTestSteps(config), [config]);
  const [answers, setAnswers] = useState<Answers>({});
  const [at, setAt] = useState(0);
  const [applied, setApplied] = useState<string | null>(null);
  const index = Math.min(at, steps.length - 1);
  const step = steps[index];
  const done = steps.every((s) => complete(answers[s.motor]));
  const result = done
    ? applyFindings(
        config,
        steps.map((s) => answers[s.motor] as BenchFinding),
      )
    : null;
  const apply = (save: boolean) => {
    if (!result?.ok || !result.message) return;
    onApply(result.config);
    setAnswers({});
    setAt(0);
    setApplied(`${result.actions.join('; ')}.`);
    if (save) onSave?.(result.message);
  };
  return (
    <div className="grid items-start gap-4 lg:grid-cols-[13rem_minmax(0,1fr)]">
      <ol aria-label="Motors in bench-test order" className="flex flex-col gap-1">
        {steps.map((s, i) => {
          const status = statusWords(s.motor, answers[s.motor]);
          return (
            <li key={s.motor}>
              <button
                type="button"
                aria-current={i === index ? 'step' : undefined}
                onClick={() => setAt(i)}
                className={cx(
                  'w-full rounded-md border px-3 py-1.5 text-left text-sm',
                  i === index ? 'border-accent bg-accent-soft' : 'border-rule hover:bg-paper-sunken',
                )}
              >
                <span className="block font-semibold">
                  {i + 1}. {s.motor}
                </span>
                <span
                  className={cx(
                    'text-xs',
                    {
                      muted: 'text-ink-muted',
                      ok: 'text-accent-strong',
                      fix: 'font-semibold text-warn-strong',
                      bad: 'font-semibold text-error',
                    }[status.tone],
                  )}
                >
                  {status.text}
                </span>
              </button>
            </li>
          );
        })}
      </ol>
      <div className="flex min-w-0 flex-col gap-3">
        <FormNotice message={applied ? `Put into the draft: ${applied}` : undefined} />
        {step && (
          <BenchStepCard
            key={step.motor}
            config={config}
            step={step}
            total={steps.length}
            finding={answers[step.motor] ?? { motor: step.motor }}
            onAnswer={(f) => {
              setApplied(null);
              setAnswers((a) => ({ ...a, [step.motor]: { ...f, motor: step.motor } }));
            }}
            disabled={!canEdit}
          />
        )}
        <div className="flex gap-2">
          <Button variant="secondary" size="sm" onClick={() => setAt(index - 1)} disabled={index === 0}>
            Previous motor
          </Button>
          <Button variant="secondary" size="sm" onClick={() => setAt(index + 1)} disabled={index >= steps.length - 1}>
            Next motor
          </Button>
        </div>
        {result && <Outcome result={result} canEdit={canEdit} canSave={Boolean(onSave)} onApply={apply} />}
      </div>
    </div>
  );
}

function Outcome({
  result,
  canEdit,
  canSave,
  onApply,
}: {
  result: ReturnType<typeof applyFindings>;
  canEdit: boolean;
  canSave: boolean;
  onApply: (save: boolean) => void;
}) {
  if (!result.ok) return <FormError message={result.reason} />;
  if (!result.message)
    return <FormNotice message="Every motor turned the expected way on its own corner: nothing to change." />;
  return (
    <section aria-label="The fix" className="rounded-md border border-accent/40 bg-accent-soft/50 px-4 py-3">
      <h3 className="font-semibold">Mixwright will fix this in the configuration, not the wiring</h3>
      <ul className="my-1 list-disc pl-5 text-sm">
        {result.actions.map((a) => (
          <li key={a}>{a.charAt(0).toUpperCase() + a.slice(1)}</li>
        ))}
      </ul>
      <p className="text-sm text-ink-muted">
        Flipping turns a motor round in the mixing; swapping exchanges which driver channel each motor is on. Run the
        bench test again after flashing.
      </p>
      {canEdit && (
        <div className="mt-2 flex gap-2">
          {canSave && <Button onClick={() => onApply(true)}>Apply and save as a revision…</Button>}
          <Button variant="secondary" onClick={() => onApply(false)}>
            Apply to the draft only
          </Button>
        </div>
      )}
    </section>
  );
}
