import type { ComponentType, LazyExoticComponent } from 'react';
import type { Problem } from '@shared/problems/problem';
import type { SectionProps } from '../sections/section-props';

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

export interface SectionCount {
  errors: number;
  warnings: number;
}

/** A draft's schema error, listed with the engine's problems. */
export interface FieldErrorProblem {
  severity: 'error';
  code: 'invalid-field';
  path: string[];
  message: string;
  hint: string;
}

export type EditorProblem = Problem | FieldErrorProblem;

/** Schema errors (by dotted path) as problems, so they count and link like the engine's. */
export function fieldErrorProblems(fieldErrors: Readonly<Record<string, string>>): FieldErrorProblem[] {
  return Object.entries(fieldErrors).map(([key, message]) => ({
    severity: 'error',
    code: 'invalid-field',
    path: key.split('.'),
    message,
    hint: 'Correct this value; the draft cannot be saved until it is valid.',
  }));
}

/** Errors and warnings per section; problems no section shows are left out. */
export function countBySection(problems: readonly EditorProblem[]): Record<SectionId, SectionCount> {
  const counts = Object.fromEntries(SECTION_IDS.map((id) => [id, { errors: 0, warnings: 0 }])) as Record<SectionId, SectionCount>;
  for (const problem of problems) {
    const section = sectionOfPath(problem.path);
    if (!section) continue;
    if (problem.severity === 'error') counts[section].errors += 1;
    else counts[section].warnings += 1;
  }
  return counts;
}
