import { NavLink } from 'react-router';
import { cx } from '@/components/ui/cx';
import { SECTION_LABELS, type SectionId } from '@/lib/editor-sections';
import type { SectionCount } from '../../lib/section-problems';

export function CountBadges({ count }: { count: SectionCount }) {
  if (count.errors === 0 && count.warnings === 0) return null;
  return (
    <span className="ml-auto flex gap-1">
      {count.errors > 0 && (
        <span
          className="rounded bg-error-soft px-1.5 text-xs font-semibold text-error-strong"
          title={`${count.errors} ${count.errors === 1 ? 'error' : 'errors'}`}
        >
          {count.errors}
          <span className="sr-only"> {count.errors === 1 ? 'error' : 'errors'}</span>
        </span>
      )}
      {count.warnings > 0 && (
        <span
          className="rounded bg-warn-soft px-1.5 text-xs font-semibold text-warn-strong"
          title={`${count.warnings} ${count.warnings === 1 ? 'warning' : 'warnings'}`}
        >
          {count.warnings}
          <span className="sr-only"> {count.warnings === 1 ? 'warning' : 'warnings'}</span>
        </span>
      )}
    </span>
  );
}

const itemClasses = ({ isActive }: { isActive: boolean }) =>
  cx(
    'flex items-center gap-2 rounded-md px-3 py-2 text-[0.95rem] font-semibold',
    isActive ? 'bg-accent-soft text-accent-strong' : 'text-ink-soft hover:bg-paper-sunken hover:text-ink',
  );

/** The sections of this build, each with its live count of errors and warnings. */
export function SectionNav({
  sections,
  counts,
  total,
}: {
  sections: SectionId[];
  counts: Record<SectionId, SectionCount>;
  total: SectionCount;
}) {
  return (
    <nav aria-label="Robot sections" className="flex flex-col gap-0.5">
      {sections.map((id) => (
        <NavLink key={id} to={`../${id}`} relative="path" className={itemClasses}>
          {SECTION_LABELS[id]}
          <CountBadges count={counts[id]} />
        </NavLink>
      ))}
      <div className="my-2 border-t border-rule" />
      <NavLink to="../problems" relative="path" className={itemClasses}>
        All problems
        <CountBadges count={total} />
      </NavLink>
    </nav>
  );
}
