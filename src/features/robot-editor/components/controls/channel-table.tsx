import { useId } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { INPUT_SOURCE_IDS, type InputSourceId } from '@shared/schemas/ids';
import { addChannel, changeSource, nextFreeChannel, removeChannel, renumberChannel } from '../../lib/controls-edits';
import { NumberCell, TableErrors, TextCell } from '../fields/draft-cells';
import { useDraftFields } from '../fields/draft-fields-context';
import { EditRefusal, EditTable, KeyCell, RemoveCell, useCheckedEdit, type EditColumn } from '../fields/edit-table';
import { compactInputClasses } from '../fields/number-input';

const SOURCE_OPTIONS = INPUT_SOURCE_IDS.map((id) => ({ value: id, label: INPUT_SOURCES[id].name }));

/** The input source and its channels, each calibrated in the source's own unit. */
export function ChannelTable() {
  const { config, update, disabled } = useDraftFields();
  const id = useId();
  const source = INPUT_SOURCES[config.controls.source];
  const renumber = useCheckedEdit();
  const columns: EditColumn[] = [
    { title: 'Ch' },
    { title: 'Name' },
    ...['Low end', 'Centre', 'High end'].map((title) => ({ title, unit: source.unit })),
  ];
  const canAdd = !disabled && nextFreeChannel(config) !== null && config.controls.channels.length < 18;
  return (
    <Panel
      title="Input and channels"
      titleId={`${id}-title`}
      description={`Calibrate each channel with the transmitter: the reading at full low, at rest and at full high, in ${source.unit}.`}
      actions={
        !disabled && (
          <Button size="sm" variant="secondary" onClick={() => update(addChannel)} disabled={!canAdd}>
            Add channel
          </Button>
        )
      }
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
          Carries up to {source.maxChannels} channels; default calibration {source.defaultCalibration.low} /{' '}
          {source.defaultCalibration.centre} / {source.defaultCalibration.high} {source.unit}. Changing the source
          resets every calibration.
        </p>
      </div>
      <EditTable field="controls.channels" caption="Channels" columns={columns}>
        {config.controls.channels.map((channel, i) => {
          const p = (key: string) => ['controls', 'channels', i, key];
          return (
            <tr key={i} className="h-10">
              <td className="py-1 pr-1.5">
                <KeyCell
                  value={String(channel.number)}
                  label={`Number of channel ${channel.number}`}
                  field={`controls.channels.${i}.number`}
                  disabled={disabled}
                  onCommit={(text) =>
                    Number(text) === channel.number || renumber.apply(renumberChannel(config, i, Number(text)))
                  }
                  numeric
                  className="w-12 text-right"
                />
              </td>
              <td className="px-1.5 py-1">
                <TextCell path={p('name')} label={`Name of channel ${channel.number}`} width="w-36" />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell path={p('low')} label={`Channel ${channel.number} low end in ${source.unit}`} />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell path={p('centre')} label={`Channel ${channel.number} centre in ${source.unit}`} />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell path={p('high')} label={`Channel ${channel.number} high end in ${source.unit}`} />
              </td>
              <RemoveCell
                what={`channel ${channel.number}`}
                show={!disabled}
                onRemove={() => update((c) => removeChannel(c, i))}
              />
            </tr>
          );
        })}
      </EditTable>
      <EditRefusal error={renumber.error} />
      <TableErrors
        prefix={['controls', 'channels']}
        rowName={(i) => `Channel ${config.controls.channels[i]?.number ?? i + 1}`}
      />
    </Panel>
  );
}
