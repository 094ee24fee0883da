import type { ComponentType, LazyExoticComponent } from 'react';
import { POWER_PROBLEM_CODES } from '@shared/power/power-advice';
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

export function isPowerProblem(problem: Pick<EditorProblem, 'code'>): boolean {
  return Object.hasOwn(POWER_PROBLEM_CODES, problem.code);
}

/**
 * The sections that show a problem, its home first; empty for a problem no section shows.
 *
 * A section counts and lists every problem it shows. The power and protection advice (driver
 * ratings against stall current, battery against drivers and motors, logic supply) is shown in
 * Safety, whatever field it points at, so Safety is the home of every power problem. Its field
 * may sit in another section — a driver's current ratings in Wiring, a motor's rated voltage in
 * Chassis — and that section counts it too: Wiring lists its problems beside the driver cards,
 * and a builder editing the field there should see the count. So a power problem counts in
 * Safety and in its field's section; the editor's total counts each problem once.
 */
export function sectionsOfProblem(problem: Pick<EditorProblem, 'code' | 'path'>): SectionId[] {
  const field = sectionOfPath(problem.path);
  const sections: (SectionId | null)[] = isPowerProblem(problem) ? ['safety', field] : [field];
  return [...new Set(sections.filter((s): s is SectionId => s !== null))];
}

/** The one section a problem is listed under where each problem appears once (all problems). */
export function homeSectionOf(problem: Pick<EditorProblem, 'code' | 'path'>): SectionId | null {
  return sectionsOfProblem(problem)[0] ?? null;
}

/** The problems a section shows, in their order. */
export function problemsOfSection<P extends EditorProblem>(problems: readonly P[], section: SectionId): P[] {
  return problems.filter((p) => sectionsOfProblem(p).includes(section));
}

/** Errors and warnings per section, as `sectionsOfProblem` places them; problems no section shows are left out. */
export function countBySection(problems: readonly EditorProblem[]): Record<SectionId, SectionCount> {
  const counts = Object.fromEntries(SECTION_IDS.map((id) => [id, { errors: 0, warnings: 0 }])) as Record<
    SectionId,
    SectionCount
  >;
  for (const problem of problems) {
    for (const section of sectionsOfProblem(problem)) {
      if (problem.severity === 'error') counts[section].errors += 1;
      else counts[section].warnings += 1;
    }
  }
  return counts;
}
