import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { renameMotor, syncMotors } from '../../lib/chassis-edits';
import { NumberCell, TableErrors } from '../fields/draft-cells';
import { useDraftFields } from '../fields/draft-fields-context';
import { EditRefusal, EditTable, KeyCell, RemoveCell, useCheckedEdit, type EditColumn } from '../fields/edit-table';

const COLUMNS: EditColumn[] = [
  { title: 'Motor' },
  { title: 'Start threshold', unit: '%', hint: 'Duty below which the motor only hums; commands jump past it' },
  { title: 'Stall current', unit: 'A', hint: "From the motor's datasheet, or measured with the shaft held" },
  { title: 'Rated', unit: 'V' },
  { title: 'Drives' },
];

/** The motors: names (renamed everywhere at once), start threshold, stall current and rated voltage. */
export function MotorTable() {
  const { config, update, disabled } = useDraftFields();
  const rename = useCheckedEdit();
  return (
    <Panel title="Motors" titleId="motor-table-title" description="The firmware's bench test runs them in this order.">
      <EditTable field="motors" caption="Motors" columns={COLUMNS} fullWidth>
        {config.motors.map((motor, i) => {
          const wheels = config.chassis.wheels.filter((w) => w.motor === motor.name).map((w) => w.name);
          return (
            <tr key={i} className="h-10">
              <td className="py-1 pr-1.5">
                <KeyCell
                  value={motor.name}
                  label={`Name of motor ${motor.name}`}
                  field={`motors.${i}.name`}
                  disabled={disabled}
                  onCommit={(text) => text.trim() === motor.name || rename.apply(renameMotor(config, i, text))}
                  className="w-32"
                />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell
                  path={['motors', i, 'startThreshold']}
                  label={`${motor.name}: start threshold in percent`}
                  scale={100}
                  width="w-16"
                />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell
                  path={['motors', i, 'stallCurrentA']}
                  label={`${motor.name}: stall current in amperes`}
                  width="w-16"
                />
              </td>
              <td className="px-1.5 py-1">
                <NumberCell path={['motors', i, 'ratedVoltage']} label={`${motor.name}: rated voltage`} width="w-16" />
              </td>
              <td
                className={cx(
                  'px-1.5 py-1 whitespace-nowrap',
                  wheels.length === 0 ? 'font-semibold text-error' : 'text-ink-soft',
                )}
              >
                {wheels.length ? wheels.join(', ') : 'no wheel'}
              </td>
              <RemoveCell
                what={motor.name}
                show={wheels.length === 0 && !disabled}
                onRemove={() => update((c) => syncMotors(c))}
              />
            </tr>
          );
        })}
      </EditTable>
      <EditRefusal error={rename.error} />
      <TableErrors
        prefix={['motors']}
        rowName={(i) => `Motor ${i + 1}${config.motors[i] ? ` (${config.motors[i].name})` : ''}`}
      />
    </Panel>
  );
}
