import type { ComponentType, LazyExoticComponent } from 'react';
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

/** The editor's sections, in the order the navigation shows them. */
export const SECTION_IDS = ['chassis', 'controls', 'wiring', 'safety', 'commissioning', 'firmware', 'history'] as const;
export type SectionId = (typeof SECTION_IDS)[number];

export const SECTION_LABELS: Record<SectionId, string> = {
  chassis: 'Chassis',
  controls: 'Controls',
  wiring: 'Wiring',
  safety: 'Safety',
  commissioning: 'Commissioning',
  firmware: 'Firmware',
  history: 'History',
};

export function isSectionId(value: string | undefined): value is SectionId {
  return (SECTION_IDS as readonly string[]).includes(value ?? '');
}

/** A section's component, loaded when first opened. */
export type SectionComponent = LazyExoticComponent<ComponentType<SectionProps>> | ComponentType<SectionProps>;
/** The sections this build offers; the app fills it in. */
export type SectionRegistry = Partial<Record<SectionId, SectionComponent>>;

// Which section shows a field, by the first key of its path.
const SECTION_OF_ROOT: Record<string, SectionId> = {
  name: 'chassis',
  chassis: 'chassis',
  motors: 'chassis',
  controls: 'controls',
  wiring: 'wiring',
  safety: 'safety',
  power: 'safety',
  firmware: 'firmware',
};

/**
 * The section that shows the field at `path`, or null for a path no section shows. The handheld
 * remote's pins are planned in Wiring beside the robot's, though they live in the link settings.
 */
export function sectionOfPath(path: readonly (string | number)[]): SectionId | null {
  if (path[0] === 'controls' && path[1] === 'link' && path[2] === 'remotePins') return 'wiring';
  return SECTION_OF_ROOT[String(path[0])] ?? null;
}
