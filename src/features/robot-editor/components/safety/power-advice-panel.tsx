import { useMemo } from 'react';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { powerAdvice } from '@shared/power/power-advice';
import type { RobotConfig } from '@shared/schemas/robot-config';

const amps = (a: number | null) => (a === null ? 'depends on the module' : `${Math.round(a * 10) / 10} A`);

/** Driver ratings against stall current, fuse and wire size, battery and supply traps, in words. */
export function PowerAdvicePanel({ config }: { config: RobotConfig }) {
  const advice = useMemo(() => powerAdvice(config), [config]);
  return (
    <Panel
      title="Power and protection advice"
      titleId="power-advice-title"
      description="Worked out from the motors’ stall currents, the drivers’ ratings and the battery."
    >
      <dl className="grid gap-3 sm:grid-cols-2 2xl:grid-cols-4">
        <Figure term="All motors stalled" value={amps(advice.stallTotalA)} />
        <Figure term="Running current (estimate)" value={amps(advice.runningA)} />
        <Figure
          term="Fuse in the battery lead"
          value={advice.fuseA ? `${advice.fuseA} A blade fuse` : 'above the largest blade fuse: use a circuit breaker'}
        />
        <Figure
          term="Battery wire"
          value={
            advice.wire
              ? `AWG ${advice.wire.awg} (${advice.wire.mm2} mm²) or thicker`
              : 'heavier than AWG tables here: ask a supplier'
          }
        />
      </dl>
      <h3 className="mt-4 mb-1 text-sm font-semibold text-ink-soft">How these were chosen</h3>
      <ul className="list-disc space-y-0.5 pl-5 text-sm text-ink-soft">
        {advice.rules.map((rule) => (
          <li key={rule}>{rule}</li>
        ))}
      </ul>
      <h3 className="mt-4 mb-1 text-sm font-semibold text-ink-soft">Drivers against the motors</h3>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Driver ratings against motor stall current</caption>
        <thead className="border-b border-rule-strong text-xs tracking-wide text-ink-muted uppercase">
          <tr>
            <th scope="col" className="py-1 pr-2">
              Driver
            </th>
            <th scope="col" className="px-2 py-1">
              Continuous
            </th>
            <th scope="col" className="px-2 py-1">
              Peak
            </th>
            <th scope="col" className="px-2 py-1">
              Worst motor stall
            </th>
            <th scope="col" className="px-2 py-1">
              Motor supply
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {advice.drivers.map((d) => {
            const overPeak = d.peakA !== null && d.worstStallA > d.peakA;
            const overContinuous = d.continuousA !== null && d.worstStallA > d.continuousA;
            return (
              <tr key={d.name}>
                <th scope="row" className="py-1 pr-2 font-semibold">
                  {d.name}
                </th>
                <td className={cx('px-2 py-1', overContinuous && 'font-semibold text-warn-strong')}>
                  {amps(d.continuousA)}
                </td>
                <td className={cx('px-2 py-1', overPeak && 'font-semibold text-error')}>{amps(d.peakA)}</td>
                <td className="px-2 py-1">{amps(d.worstStallA)}</td>
                <td className="px-2 py-1">
                  {d.motorVolts ? `${d.motorVolts.min}–${d.motorVolts.max} V` : 'per module'}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {advice.problems.length > 0 && (
        <ul className="mt-4 space-y-1.5 text-sm">
          {advice.problems.map((p) => (
            <li
              key={`${p.code}-${p.path.join('.')}`}
              className={cx(
                'rounded border px-3 py-1.5',
                p.severity === 'error' ? 'border-error/30 bg-error-soft' : 'border-warn/30 bg-warn-soft',
              )}
            >
              <span className={cx('font-semibold', p.severity === 'error' ? 'text-error-strong' : 'text-warn-strong')}>
                {p.severity === 'error' ? 'Error: ' : 'Warning: '}
                {p.message}
              </span>{' '}
              <span className="text-ink-soft">{p.hint}</span>
            </li>
          ))}
        </ul>
      )}
      <h3 className="mt-4 mb-1 text-sm font-semibold text-ink-soft">For this robot</h3>
      <ul className="list-disc space-y-0.5 pl-5 text-sm text-ink-soft">
        {advice.notes.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
    </Panel>
  );
}

function Figure({ term, value }: { term: string; value: string }) {
  return (
    <div className="rounded border border-rule bg-paper px-3 py-2">
      <dt className="text-xs tracking-wide text-ink-muted uppercase">{term}</dt>
      <dd className="font-semibold">{value}</dd>
    </div>
  );
}
