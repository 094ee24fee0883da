import { useId } from 'react';
import { inputClasses } from '@/components/ui/text-field';
import { cx } from '@/components/ui/cx';
import { ROBOT_FILTERS, type RobotFilter } from '../lib/robot-list-words';

export interface RobotTableFiltersProps {
  search: string;
  onSearch: (text: string) => void;
  status: RobotFilter;
  onStatus: (filter: RobotFilter) => void;
  shown: number;
  total: number;
}

/** Search and filter above the robot table, with a count read out as it changes. */
export function RobotTableFilters({ search, onSearch, status, onStatus, shown, total }: RobotTableFiltersProps) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-search`} className="text-sm font-semibold text-ink-soft">
          Find
        </label>
        <input
          id={`${id}-search`}
          type="search"
          value={search}
          onChange={(e) => onSearch(e.target.value)}
          placeholder="Name, layout or board"
          className={cx(inputClasses, 'w-64 border-rule-strong py-1.5')}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-status`} className="text-sm font-semibold text-ink-soft">
          Show
        </label>
        <select
          id={`${id}-status`}
          value={status}
          onChange={(e) => onStatus(e.target.value as RobotFilter)}
          className={cx(inputClasses, 'w-64 border-rule-strong py-1.5')}
        >
          {ROBOT_FILTERS.map((f) => (
            <option key={f.value} value={f.value}>
              {f.label}
            </option>
          ))}
        </select>
      </div>
      <p className="ml-auto pb-2 text-sm text-ink-muted" aria-live="polite">
        {shown === total ? `${total} ${total === 1 ? 'robot' : 'robots'}` : `${shown} of ${total} robots`}
      </p>
    </div>
  );
}
