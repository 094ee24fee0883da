import { z } from 'zod';
import { assignPins } from '@shared/pins/assign-pins';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import { BoardIdSchema, DriveLayoutIdSchema, DriverKindIdSchema, InputSourceIdSchema } from '@shared/schemas/ids';
import { RobotNameSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';

/** The short "new robot" form. */
export const NewRobotFormSchema = z.object({
  name: RobotNameSchema,
  layout: DriveLayoutIdSchema,
  board: BoardIdSchema,
  input: InputSourceIdSchema,
  driver: DriverKindIdSchema,
});
export type NewRobotForm = z.infer<typeof NewRobotFormSchema>;

/** What the form offers first: a small three-wheel robot whose parts fit and wire up cleanly. */
export const NEW_ROBOT_DEFAULTS: NewRobotForm = {
  name: '',
  layout: 'trio-omni',
  board: 'nano',
  input: 'ppm',
  driver: 'pwm-in1-in2-stby',
};

export interface StarterRobot {
  config: RobotConfig;
  /** Whether the pin plan placed every pin; when not, the reason in one sentence. */
  pins: { placed: true } | { placed: false; reason: string };
  /** The first revision's message. */
  message: string;
}

/** A starter configuration with its pins placed automatically when a plan exists. */
export function starterRobot(form: Omit<NewRobotForm, 'name'> & { name?: string }): StarterRobot {
  const starter = buildStarterConfig({
    layout: form.layout,
    board: form.board,
    input: form.input,
    driver: form.driver,
    name: form.name || undefined,
  });
  const placed = assignPins(starter);
  const from = `Started from the ${LAYOUT_LABELS[form.layout]} starter layout`;
  if (placed.ok)
    return { config: placed.config, pins: { placed: true }, message: `${from}; pins placed automatically` };
  return { config: starter, pins: { placed: false, reason: placed.reason }, message: `${from}; pins left unassigned` };
}
