import { Panel } from '@/components/ui/panel';
import { homeSectionOf, type EditorProblem } from '../../lib/section-problems';
import { SECTION_IDS, SECTION_LABELS, type SectionId } from '@/lib/editor-sections';
import { ProblemList } from './problem-list';

/**
 * Every problem of the draft once, grouped by its home section: a power problem under Safety,
 * which explains it, any other under the section with its field. Each links to its field.
 */
export function AllProblems({
  problems,
  available,
}: {
  problems: readonly EditorProblem[];
  available: readonly SectionId[];
}) {
  if (problems.length === 0) {
    return (
      <Panel title="All problems" titleId="all-problems-title">
        <p className="text-accent-strong">
          No errors or warnings: the engine, the pin check and the power advice are all satisfied.
        </p>
      </Panel>
    );
  }
  const groups = [...SECTION_IDS, null].map((section) => ({
    section,
    items: problems.filter((p) => homeSectionOf(p) === section),
  }));
  return (
    <Panel
      title="All problems"
      titleId="all-problems-title"
      description="From the drive engine, the pin check, the power advice and the form's own checks. Errors first."
    >
      <div className="flex flex-col gap-4">
        {groups
          .filter((g) => g.items.length > 0)
          .map((g) => (
            <section key={g.section ?? 'other'} aria-label={g.section ? SECTION_LABELS[g.section] : 'Other'}>
              <h3 className="border-b border-rule pb-1 font-semibold">
                {g.section ? SECTION_LABELS[g.section] : 'Other'}
              </h3>
              <ProblemList problems={g.items} available={available} />
            </section>
          ))}
      </div>
    </Panel>
  );
}
