import type { ReactNode } from 'react';
import { cx } from '@/components/ui/cx';
import type { PinRef } from '../lib/sheet-model';

/** A ruled table for the sheet: hairlines that print, headings in small capitals. */
export function SheetTable({
  caption,
  head,
  children,
  className,
}: {
  caption: string;
  head: string[];
  children: ReactNode;
  className?: string;
}) {
  return (
    <table className={cx('w-full border-collapse text-left text-[13px]', className)}>
      <caption className="sr-only">{caption}</caption>
      <thead>
        <tr className="border-b-2 border-ink">
          {head.map((h) => (
            <th
              key={h}
              scope="col"
              className="px-1.5 py-1 text-[11px] font-semibold tracking-wide text-ink-soft uppercase first:pl-0 print:py-0.5"
            >
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="divide-y divide-rule-strong">{children}</tbody>
    </table>
  );
}

export function Cell({
  children,
  className,
  mono = false,
  rowSpan,
}: {
  children: ReactNode;
  className?: string;
  mono?: boolean;
  rowSpan?: number;
}) {
  return (
    <td
      rowSpan={rowSpan}
      className={cx('px-1.5 py-1 align-top first:pl-0 print:py-0', mono && 'font-mono text-[12.5px]', className)}
    >
      {children}
    </td>
  );
}

/** Pin id, silkscreen label and code in three cells; "no pin" stands out. */
export function PinCells({ pin }: { pin: PinRef }) {
  if (pin.id === null) {
    return (
      <>
        <Cell className="font-semibold text-error-strong">no pin</Cell>
        <Cell>—</Cell>
        <Cell>—</Cell>
      </>
    );
  }
  return (
    <>
      <Cell mono className="font-medium">
        {pin.id}
        {pin.unknown && <span className="font-sans text-error-strong"> (not on this board)</span>}
      </Cell>
      <Cell mono>{pin.label ?? '—'}</Cell>
      <Cell mono>{pin.code ?? '—'}</Cell>
    </>
  );
}
