import { useMemo, useState } from 'react';
import type { FirmwareFile } from '@shared/schemas/firmware';
import { Button } from '@/components/ui/button';
import { formatBytes } from '../lib/file-groups';
import { highlightHtml, lineCount } from '../lib/highlight';
import './code-view.css';

const LANGUAGE_NAMES: Record<FirmwareFile['language'], string> = {
  cpp: 'C++',
  json: 'JSON',
  markdown: 'Markdown',
  text: 'Text',
};

/** One file of the bundle, highlighted, with line numbers and a copy button. */
export function CodeView({ file }: { file: FirmwareFile }) {
  const html = useMemo(() => highlightHtml(file.content, file.language), [file.content, file.language]);
  const lines = useMemo(
    () => Array.from({ length: lineCount(file.content) }, (_, i) => i + 1).join('\n'),
    [file.content],
  );
  const [copied, setCopied] = useState<string | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(file.content);
      setCopied(file.path);
    } catch {
      setCopied(null);
    }
  };

  return (
    <figure className="flex min-w-0 flex-col overflow-hidden rounded-md border border-rule bg-paper-raised">
      <figcaption className="flex flex-wrap items-center justify-between gap-2 border-b border-rule bg-paper-sunken/60 px-3 py-1.5">
        <span className="font-mono text-sm font-semibold text-ink">{file.path}</span>
        <span className="flex items-center gap-3 text-xs text-ink-muted">
          <span>
            {LANGUAGE_NAMES[file.language]} · {lineCount(file.content)} lines · {formatBytes(file.size)}
          </span>
          <Button variant="quiet" size="sm" onClick={copy} aria-label={`Copy ${file.path}`}>
            {copied === file.path ? 'Copied' : 'Copy'}
          </Button>
        </span>
      </figcaption>
      <div
        className="flex max-h-[34rem] overflow-auto font-mono text-[0.8rem] leading-5"
        tabIndex={0}
        aria-label={`Contents of ${file.path}`}
      >
        <pre
          aria-hidden="true"
          className="sticky left-0 shrink-0 border-r border-rule bg-paper-raised px-2 py-2 text-right text-ink-faint select-none"
        >
          {lines}
        </pre>
        <pre className="mw-code min-w-0 flex-1 px-3 py-2 text-ink">
          <code dangerouslySetInnerHTML={{ __html: html }} />
        </pre>
      </div>
    </figure>
  );
}
