import { POWER_PROBLEM_CODES } from '@shared/power/power-advice';
import type { Problem } from '@shared/problems/problem';
import { sectionOfPath, SECTION_IDS, type SectionId } from '@/lib/editor-sections';

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
