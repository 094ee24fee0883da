import { cx } from '@/components/ui/cx';
import { fileName, formatBytes, type FileGroup } from '../lib/file-groups';

function FolderGlyph() {
  return (
    <svg viewBox="0 0 16 16" className="size-3.5 shrink-0 text-ink-faint" aria-hidden="true">
      <path
        d="M1.5 3.5h4.2l1.4 1.6h7.4v7.4h-13z"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.3"
        strokeLinejoin="round"
      />
    </svg>
  );
}

/** The bundle's files by folder; choosing one shows it in the preview. */
export function FileTree({
  groups,
  selected,
  onSelect,
}: {
  groups: FileGroup[];
  selected: string | null;
  onSelect: (path: string) => void;
}) {
  return (
    <nav aria-label="Files in the bundle" className="space-y-3 text-sm">
      {groups.map((group) => (
        <section key={group.id} aria-labelledby={`fw-group-${group.id}`}>
          <h3 id={`fw-group-${group.id}`} className="px-2 text-xs font-semibold tracking-wide text-ink-muted uppercase">
            {group.title}
          </h3>
          {group.folder && (
            <p className="mt-1 flex items-center gap-1.5 px-2 font-mono text-xs text-ink-soft">
              <FolderGlyph />
              {group.folder}/
            </p>
          )}
          <ul className={cx('mt-0.5', group.folder && 'ml-3.5 border-l border-rule')}>
            {group.files.map((file) => {
              const current = file.path === selected;
              return (
                <li key={file.path}>
                  <button
                    type="button"
                    onClick={() => onSelect(file.path)}
                    aria-current={current ? 'true' : undefined}
                    className={cx(
                      'flex w-full items-baseline justify-between gap-2 rounded-r px-2 py-0.5 text-left font-mono text-[0.8rem]',
                      current ? 'bg-accent-soft font-semibold text-accent-strong' : 'text-ink hover:bg-paper-sunken',
                    )}
                  >
                    <span className="min-w-0 break-all">{fileName(file.path)}</span>
                    <span className="shrink-0 font-sans text-xs text-ink-faint">{formatBytes(file.size)}</span>
                  </button>
                </li>
              );
            })}
          </ul>
        </section>
      ))}
    </nav>
  );
}
