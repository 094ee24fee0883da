import { useState } from 'react';
import { Button } from '@/components/ui/button';
import type { EditorProblem, SectionId } from '../../lib/editor-sections';
import { ProblemList } from './problem-list';

const FIRST = 3;

/** The current section's problems above its content: the first few, the rest on request. */
export function SectionProblems({ problems, available, label }: { problems: readonly EditorProblem[]; available: readonly SectionId[]; label: string }) {
  const [expanded, setExpanded] = useState(false);
  if (problems.length === 0) return null;
  const errors = problems.filter((p) => p.severity === 'error').length;
  const warnings = problems.length - errors;
  const shown = expanded ? problems : problems.slice(0, FIRST);
  return (
    <section aria-label={`Problems in ${label}`} className="mb-4 rounded-lg border border-rule bg-paper-raised px-4 py-2">
      <h2 className="text-sm font-semibold text-ink-soft">
        {label}: {[errors > 0 && `${errors} ${errors === 1 ? 'error' : 'errors'}`, warnings > 0 && `${warnings} ${warnings === 1 ? 'warning' : 'warnings'}`].filter(Boolean).join(', ')}
      </h2>
      <ProblemList problems={shown} available={available} />
      {problems.length > FIRST && (
        <Button variant="quiet" size="sm" onClick={() => setExpanded((e) => !e)} aria-expanded={expanded}>
          {expanded ? 'Show fewer' : `Show all ${problems.length}`}
        </Button>
      )}
    </section>
  );
}
