import type { Problem } from '@shared/problems/problem';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RobotDetail } from '@shared/schemas/robots';

/**
 * What every section of the robot editor receives from the editor shell.
 *
 * Linking to fields: the shell opens a section with `?field=<dotted path>` (for example
 * `wiring.drivers.0.pins.a.pwm`) when someone follows a problem. It then looks for an element
 * with a matching `data-field` attribute, trying shorter paths until one matches, scrolls it
 * into view, focuses it and flashes it. Give inputs (or the row or table around them) a
 * `data-field` so problems can lead there.
 */
export interface SectionProps {
  robot: RobotDetail['robot'];
  /** The head revision the draft started from. */
  head: RobotDetail['head'];
  /**
   * The current draft, every default filled in. While someone is typing it may hold values the
   * schema refuses (an empty number is NaN, a radius of 0): show them as typed, with the
   * reasons from `fieldErrors`.
   */
  config: RobotConfig;
  /** Replace the draft; the shell keeps it per robot (surviving a reload) and marks it unsaved. */
  onChange: (next: RobotConfig) => void;
  /** Every problem of the draft (robotProblems), errors first. */
  problems: Problem[];
  /** False for viewers: show everything, change nothing. */
  canEdit: boolean;
  /**
   * The newest draft that passed RobotConfigSchema: safe to hand to the engine and drawings.
   * Equal to `config` whenever the draft is valid.
   */
  validConfig?: RobotConfig;
  /** The schema's reasons for the draft's invalid fields, by dotted path (`chassis.wheels.1.radiusMm`). */
  fieldErrors?: Readonly<Record<string, string>>;
  /** Open the shell's save dialog with a suggested revision message. */
  requestSave?: (message: string) => void;
}
