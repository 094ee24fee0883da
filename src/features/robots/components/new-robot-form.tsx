import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useController, useForm, useWatch, type Control } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { submitWithServerErrors } from '@/lib/form-errors';
import { BOARDS } from '@shared/boards/boards';
import { DRIVER_KINDS } from '@shared/drivers/driver-kinds';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import { BOARD_IDS, DRIVE_LAYOUT_IDS, DRIVER_KIND_IDS, INPUT_SOURCE_IDS } from '@shared/schemas/ids';
import type { RobotSummary } from '@shared/schemas/robots';
import { useCreateRobot } from '../api/create-robot';
import {
  NEW_ROBOT_DEFAULTS,
  NewRobotFormSchema,
  starterRobot,
  type NewRobotForm as Values,
} from '../lib/starter-robot';

const layoutOptions = DRIVE_LAYOUT_IDS.map((id) => ({ value: id, label: LAYOUT_LABELS[id] }));
const boardOptions = BOARD_IDS.map((id) => ({ value: id, label: BOARDS[id].name }));
const inputOptions = INPUT_SOURCE_IDS.map((id) => ({ value: id, label: INPUT_SOURCES[id].name }));
const driverOptions = DRIVER_KIND_IDS.map((id) => ({ value: id, label: DRIVER_KINDS[id].name }));

/** A robot from a starter layout: five choices, with the pin plan tried before anything is saved. */
export function NewRobotForm({
  teamId,
  onCreated,
  onCancel,
}: {
  teamId: string;
  onCreated: (robot: RobotSummary) => void;
  onCancel: () => void;
}) {
  const create = useCreateRobot(teamId);
  const form = useForm<Values>({ resolver: zodResolver(NewRobotFormSchema), defaultValues: NEW_ROBOT_DEFAULTS });
  const { errors } = form.formState;
  const [layout, board, input, driver] = useWatch({
    control: form.control,
    name: ['layout', 'board', 'input', 'driver'],
  });
  const preview = useMemo(() => starterRobot({ layout, board, input, driver }), [layout, board, input, driver]);

  const onSubmit = submitWithServerErrors(form, ['name'], async (values) => {
    const starter = starterRobot(values);
    onCreated(
      await create.mutateAsync({
        name: values.name,
        config: { ...starter.config, name: values.name },
        message: starter.message,
      }),
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <FormError message={errors.root?.server?.message} />
      <TextField
        label="Robot name"
        autoComplete="off"
        autoFocus
        error={errors.name?.message}
        {...form.register('name')}
      />
      {/* Input sources and driver kinds have long names: each gets the full width so none is cut off. */}
      <div className="grid gap-3 sm:grid-cols-2">
        <ChoiceField control={form.control} name="layout" label="Starter layout" options={layoutOptions} />
        <ChoiceField control={form.control} name="board" label="Board" options={boardOptions} />
        <ChoiceField
          control={form.control}
          name="input"
          label="Input source"
          options={inputOptions}
          className="sm:col-span-2"
        />
        <ChoiceField
          control={form.control}
          name="driver"
          label="Motor driver"
          options={driverOptions}
          className="sm:col-span-2"
        />
      </div>
      <div role="status" className="min-h-12 rounded-md border border-rule bg-paper px-3 py-2 text-sm">
        <p className="font-semibold text-ink-soft">
          {preview.config.motors.length} motors on {preview.config.wiring.drivers.length}{' '}
          {preview.config.wiring.drivers.length === 1 ? 'driver' : 'drivers'}, {preview.config.controls.channels.length}{' '}
          channels.
        </p>
        {preview.pins.placed ? (
          <p className="text-accent-strong">
            Every pin can be placed automatically; you can change them later in Wiring.
          </p>
        ) : (
          <p className="text-warn-strong">
            Pins cannot be placed automatically: {preview.pins.reason} The robot starts with its pins unassigned.
          </p>
        )}
      </div>
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={form.formState.isSubmitting}>
          Cancel
        </Button>
        <Button type="submit" busy={form.formState.isSubmitting}>
          Create robot
        </Button>
      </div>
    </form>
  );
}

/** A controlled select: the form state, not the DOM, holds the choice. */
function ChoiceField({
  control,
  name,
  label,
  options,
  className,
}: {
  control: Control<Values>;
  name: Exclude<keyof Values, 'name'>;
  label: string;
  options: { value: string; label: string }[];
  className?: string;
}) {
  const { field, fieldState } = useController({ control, name });
  return (
    <SelectField
      label={label}
      options={options}
      className={className}
      error={fieldState.error?.message}
      name={field.name}
      value={field.value}
      onChange={field.onChange}
      onBlur={field.onBlur}
      ref={field.ref}
    />
  );
}
