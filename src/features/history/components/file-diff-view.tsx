import type { DiffLine, DiffRow, FileDiff } from '@shared/history/file-diff';

// Side by side in the code face: the old file on the left, the new on the right. Removed and
// changed lines are brick red on the left, added and changed lines teal on the right; the
// changed part of a changed line is marked more strongly.

function Text({ line, strong }: { line: DiffLine; strong: string }) {
  if (!line.span || line.span[0] >= line.span[1]) return <>{line.text || ' '}</>;
  const [a, b] = line.span;
  return (
    <>
      {line.text.slice(0, a)}
      <mark className={`rounded-sm ${strong}`}>{line.text.slice(a, b)}</mark>
      {line.text.slice(b)}
    </>
  );
}

const SIDE = {
  left: { soft: 'bg-error-soft', strong: 'bg-error/25 text-ink', mark: '−' },
  right: { soft: 'bg-accent-soft', strong: 'bg-accent/25 text-ink', mark: '+' },
};

function Cell({ line, side, changed }: { line: DiffLine | null; side: 'left' | 'right'; changed: boolean }) {
  const look = SIDE[side];
  if (!line) return <td colSpan={2} className="bg-paper-sunken/60" />;
  return (
    <>
      <td className="w-10 border-r border-rule px-2 text-right align-top text-ink-faint select-none">{line.number}</td>
      <td className={`px-2 align-top whitespace-pre-wrap break-all ${changed ? look.soft : ''}`}>
        {changed && <span className="sr-only">{side === 'left' ? 'removed: ' : 'added: '}</span>}
        <Text line={line} strong={look.strong} />
      </td>
    </>
  );
}

function Row({ row }: { row: DiffRow }) {
  if (row.kind === 'skip') {
    return (
      <tr className="bg-paper-sunken text-ink-muted">
        <td colSpan={4} className="px-2 py-0.5 text-center font-sans text-xs">
          ⋯ {row.count} unchanged {row.count === 1 ? 'line' : 'lines'}
        </td>
      </tr>
    );
  }
  const changed = row.kind !== 'same';
  return (
    <tr>
      <Cell line={row.left} side="left" changed={changed} />
      <Cell line={row.right} side="right" changed={changed} />
    </tr>
  );
}

const STATUS_WORDS: Record<FileDiff['status'], string> = {
  changed: 'changed',
  added: 'new file',
  removed: 'file removed',
};

/** One generated file's change, collapsible, with its counts in the summary. */
export function FileDiffView({ file, from, to, open }: { file: FileDiff; from: number; to: number; open?: boolean }) {
  return (
    <details open={open} className="rounded-md border border-rule">
      <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 px-3 py-2 hover:bg-paper-sunken">
        <span className="font-mono text-sm font-semibold">{file.path}</span>
        <span className="text-sm text-ink-muted">{STATUS_WORDS[file.status]}</span>
        <span className="font-mono text-sm text-accent-strong">+{file.added}</span>
        <span className="font-mono text-sm text-error">−{file.removed}</span>
      </summary>
      <div className="overflow-x-auto border-t border-rule">
        <table className="w-full table-fixed border-collapse font-mono text-[0.8rem] leading-5">
          <caption className="sr-only">{`${file.path}: revision ${from} on the left, revision ${to} on the right`}</caption>
          <colgroup>
            <col className="w-10" />
            <col />
            <col className="w-10" />
            <col />
          </colgroup>
          <thead className="sr-only">
            <tr>
              <th scope="col">Line in r{from}</th>
              <th scope="col">r{from}</th>
              <th scope="col">Line in r{to}</th>
              <th scope="col">r{to}</th>
            </tr>
          </thead>
          <tbody>
            {file.rows.map((row, i) => (
              <Row key={i} row={row} />
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
