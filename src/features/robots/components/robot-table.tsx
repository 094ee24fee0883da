import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortFn,
} from '@tanstack/react-table';
import { useId, useState } from 'react';
import { Link } from 'react-router';
import { cx } from '@/components/ui/cx';
import { formatDate } from '@/lib/format';
import type { RobotListItem } from '@shared/schemas/robots';
import {
  boardLabel,
  boardName,
  layoutLabel,
  problemWords,
  robotFilterMatches,
  type RobotFilter,
} from '../lib/robot-list-words';
import { RobotTableFilters } from './robot-table-filters';

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { text: sortFn_text, basic: sortFn_basic },
  columnFilteringFeature,
  globalFilteringFeature,
  filteredRowModel: createFilteredRowModel(),
});

type Features = typeof features;
const helper = createColumnHelper<Features, RobotListItem>();

// Errors count more than warnings; an unreadable head sorts last.
const byProblems: SortFn<Features, RobotListItem> = (a, b) => {
  const weight = (r: RobotListItem) => (r.problems ? r.problems.errors * 1000 + r.problems.warnings : -1);
  return weight(a.original) - weight(b.original);
};

const byStatus: FilterFn<Features, RobotListItem> = (row, _id, filter: RobotFilter) =>
  robotFilterMatches(row.original, filter);

const searchAll: FilterFn<Features, RobotListItem> = (row, _id, text: string) => {
  const r = row.original;
  const haystack = `${r.name} ${layoutLabel(r.layout)} ${boardLabel(r.board)} ${boardName(r.board)}`.toLowerCase();
  return haystack.includes(String(text).trim().toLowerCase());
};

const columns = helper.columns([
  helper.accessor('name', {
    header: 'Robot',
    sortFn: 'text',
    cell: (info) => (
      <span className="inline-flex items-center gap-2">
        {info.row.original.photoUrl && (
          <img
            src={info.row.original.photoUrl}
            alt=""
            width={32}
            height={32}
            loading="lazy"
            className="size-8 rounded border border-rule object-cover"
          />
        )}
        <Link
          to={`robots/${info.row.original.id}`}
          className="font-semibold text-accent-strong underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
      </span>
    ),
  }),
  helper.accessor((r) => layoutLabel(r.layout), { id: 'layout', header: 'Drive layout', sortFn: 'text' }),
  helper.accessor((r) => boardLabel(r.board), {
    id: 'board',
    header: 'Board',
    sortFn: 'text',
    cell: (info) => <span title={boardName(info.row.original.board)}>{info.getValue()}</span>,
  }),
  helper.accessor('headRevision', {
    header: 'Head',
    sortFn: 'basic',
    cell: (info) => <span className="font-mono">r{info.getValue()}</span>,
  }),
  helper.accessor((r) => (r.lastFlash ? new Date(r.lastFlash.flashedAt).getTime() : undefined), {
    id: 'flashed',
    header: 'On the robot',
    sortFn: 'basic',
    sortUndefined: 'last',
    cell: (info) => <FlashCell robot={info.row.original} />,
  }),
  helper.accessor((r) => r.problems?.errors ?? -1, {
    id: 'problems',
    header: 'Open problems',
    sortFn: byProblems,
    sortDescFirst: true,
    filterFn: byStatus,
    cell: (info) => <ProblemCell robot={info.row.original} />,
  }),
]);

const initialState = { sorting: [{ id: 'name', desc: false }] };

/** The team's robots: sortable by every column, searchable, and filterable by their state. */
export function RobotTable({ robots, teamName }: { robots: RobotListItem[]; teamName: string }) {
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const captionId = useId();
  const table = useTable({
    features,
    columns,
    data: robots,
    initialState,
    state: { globalFilter, columnFilters },
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    globalFilterFn: searchAll,
    getColumnCanGlobalFilter: (column) => column.id === 'name',
  });
  const status = (columnFilters.find((f) => f.id === 'problems')?.value as RobotFilter | undefined) ?? 'all';
  const rows = table.getRowModel().rows;
  return (
    <div className="flex flex-col gap-3">
      <RobotTableFilters
        search={globalFilter}
        onSearch={(text) => table.setGlobalFilter(text)}
        status={status}
        onStatus={(next) => table.getColumn('problems')?.setFilterValue(next === 'all' ? undefined : next)}
        shown={rows.length}
        total={robots.length}
      />
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left text-[0.95rem]" aria-describedby={captionId}>
          <caption id={captionId} className="sr-only">
            Robots of {teamName}. Column headings sort the table.
          </caption>
          <thead className="border-b border-rule-strong text-xs tracking-wide text-ink-muted uppercase">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                      className={cx(
                        'px-3 py-1.5 font-semibold whitespace-nowrap first:pl-0 last:pr-0',
                        header.column.id === 'headRevision' && 'text-right',
                      )}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1 rounded uppercase hover:text-ink"
                      >
                        <table.FlexRender header={header} />
                        <SortMark direction={sorted} />
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-rule">
            {rows.map((row) => (
              <tr key={row.id} className="hover:bg-paper/70">
                {row.getAllCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={cx(
                      'px-3 py-2.5 align-middle first:pl-0 last:pr-0',
                      cell.column.id === 'headRevision' && 'text-right',
                    )}
                  >
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length === 0 && (
        <p className="py-4 text-center text-sm text-ink-muted">No robot matches the search and filter.</p>
      )}
    </div>
  );
}

function SortMark({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <span aria-hidden="true" className={cx('inline-block w-3 text-center', !direction && 'text-ink-faint')}>
      {direction === 'asc' ? '▲' : direction === 'desc' ? '▼' : '↕'}
    </span>
  );
}

function FlashCell({ robot }: { robot: RobotListItem }) {
  if (!robot.lastFlash) return <span className="text-ink-faint">not flashed yet</span>;
  const behind = robot.lastFlash.revisionNumber !== robot.headRevision;
  return (
    <span className="whitespace-nowrap">
      <span className="font-mono">r{robot.lastFlash.revisionNumber}</span>
      <span className="text-ink-muted"> · {formatDate(robot.lastFlash.flashedAt)}</span>
      {behind && (
        <span className="ml-2 rounded border border-warn/30 bg-warn-soft px-1.5 py-0.5 text-xs font-semibold text-warn-strong">
          behind head
        </span>
      )}
    </span>
  );
}

function ProblemCell({ robot }: { robot: RobotListItem }) {
  const p = robot.problems;
  if (!p) return <span className="text-ink-faint">{problemWords(p)}</span>;
  if (p.errors === 0 && p.warnings === 0) return <span className="text-accent-strong">{problemWords(p)}</span>;
  return (
    <span className="flex gap-1.5 whitespace-nowrap">
      {p.errors > 0 && (
        <span className="rounded border border-error/30 bg-error-soft px-1.5 py-0.5 text-xs font-semibold text-error-strong">
          {p.errors} {p.errors === 1 ? 'error' : 'errors'}
        </span>
      )}
      {p.warnings > 0 && (
        <span className="rounded border border-warn/30 bg-warn-soft px-1.5 py-0.5 text-xs font-semibold text-warn-strong">
          {p.warnings} {p.warnings === 1 ? 'warning' : 'warnings'}
        </span>
      )}
    </span>
  );
}
