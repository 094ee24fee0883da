import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { INPUT_SOURCE_IDS, type InputSourceId } from '@shared/schemas/ids';
import { addChannel, changeSource, nextFreeChannel, removeChannel, renumberChannel } from '../../lib/controls-edits';
import { NumberCell, TableErrors, TextCell } from '../fields/draft-cells';
import { useDraftFields } from '../fields/draft-fields-context';
import { compactInputClasses } from '../fields/number-input';

const SOURCE_OPTIONS = INPUT_SOURCE_IDS.map((id) => ({ value: id, label: INPUT_SOURCES[id].name }));

/** The input source and its channels, each calibrated in the source's own unit. */
export function ChannelTable() {
  const { config, update, disabled } = useDraftFields();
  const id = useId();
  const source = INPUT_SOURCES[config.controls.source];
  const [numberError, setNumberError] = useState<string | null>(null);
  const canAdd = !disabled && nextFreeChannel(config) !== null && config.controls.channels.length < 18;
  return (
    <Panel
      title="Input and channels"
      titleId={`${id}-title`}
      description={`Calibrate each channel with the transmitter: the reading at full low, at rest and at full high, in ${source.unit}.`}
      actions={!disabled && <Button size="sm" variant="secondary" onClick={() => update(addChannel)} disabled={!canAdd}>Add channel</Button>}
    >
      <div className="mb-3 flex flex-col gap-1">
        <label htmlFor={`${id}-source`} className="text-sm font-semibold text-ink-soft">
          Input source
        </label>
        <select
          id={`${id}-source`}
          data-field="controls.source"
          value={config.controls.source}
          disabled={disabled}
          onChange={(e) => update((c) => changeSource(c, e.target.value as InputSourceId))}
          className={cx(compactInputClasses, 'w-80 border-rule-strong py-1.5')}
        >
          {SOURCE_OPTIONS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <p className="text-xs text-ink-muted">
          Carries up to {source.maxChannels} channels; default calibration {source.defaultCalibration.low} / {source.defaultCalibration.centre} / {source.defaultCalibration.high} {source.unit}. Changing the source resets every calibration.
        </p>
      </div>
      <div className="overflow-x-auto" data-field="controls.channels">
        <table className="border-collapse text-left text-sm">
          <caption className="sr-only">Channels</caption>
          <thead className="border-b border-rule-strong text-xs text-ink-muted">
            <tr>
              <th scope="col" className="py-1 pr-1.5 font-semibold tracking-wide uppercase">Ch</th>
              <th scope="col" className="px-1.5 py-1 font-semibold tracking-wide uppercase">Name</th>
              {['Low end', 'Centre', 'High end'].map((t) => (
                <th key={t} scope="col" className="px-1.5 py-1 font-semibold">
                  <span className="tracking-wide uppercase">{t}</span> ({source.unit})
                </th>
              ))}
              <th scope="col" className="w-10"><span className="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {config.controls.channels.map((channel, i) => {
              const p = (key: string) => ['controls', 'channels', i, key];
              return (
                <tr key={i} className="h-10">
                  <td className="py-1 pr-1.5">
                    <ChannelNumberCell
                      index={i}
                      number={channel.number}
                      disabled={disabled}
                      onRenumber={(n) => {
                        const result = renumberChannel(config, i, n);
                        setNumberError(result.ok ? null : result.reason);
                        if (result.ok) update(() => result.config);
                        return result.ok;
                      }}
                    />
                  </td>
                  <td className="px-1.5 py-1"><TextCell path={p('name')} label={`Name of channel ${channel.number}`} width="w-36" /></td>
                  <td className="px-1.5 py-1"><NumberCell path={p('low')} label={`Channel ${channel.number} low end in ${source.unit}`} /></td>
                  <td className="px-1.5 py-1"><NumberCell path={p('centre')} label={`Channel ${channel.number} centre in ${source.unit}`} /></td>
                  <td className="px-1.5 py-1"><NumberCell path={p('high')} label={`Channel ${channel.number} high end in ${source.unit}`} /></td>
                  <td className="py-1 pl-1.5 text-right">
                    {!disabled && (
                      <Button size="sm" variant="quiet" aria-label={`Remove channel ${channel.number}`} title={`Remove channel ${channel.number}`} onClick={() => update((c) => removeChannel(c, i))}>
                        ✕
                      </Button>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {numberError && <p role="alert" className="mt-2 text-xs font-semibold text-error">✕ {numberError}</p>}
      <TableErrors prefix={['controls', 'channels']} rowName={(i) => `Channel ${config.controls.channels[i]?.number ?? i + 1}`} />
    </Panel>
  );
}

/** The number is committed when the field is left (or Enter pressed), so the stick map follows once. */
function ChannelNumberCell({ index, number, disabled, onRenumber }: { index: number; number: number; disabled: boolean; onRenumber: (n: number) => boolean }) {
  const [text, setText] = useState(String(number));
  useEffect(() => setText(String(number)), [number]);
  const commit = () => {
    const n = Number(text);
    if (n !== number && !onRenumber(n)) setText(String(number));
  };
  return (
    <input
      type="text"
      inputMode="numeric"
      aria-label={`Number of channel ${number}`}
      data-field={`controls.channels.${index}.number`}
      value={text}
      disabled={disabled}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => e.key === 'Enter' && commit()}
      className={cx(compactInputClasses, 'w-12 border-rule-strong text-right')}
    />
  );
}
