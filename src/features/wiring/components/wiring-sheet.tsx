import './wiring-sheet.css';
import { getBoard } from '@shared/boards/boards';
import { collectDemands } from '@shared/pins/pin-demands';
import { powerAdvice } from '@shared/power/power-advice';
import { robotProblems } from '@shared/problems/robot-problems';
import type { RevisionDetail } from '@shared/schemas/robots';
import { cx } from '@/components/ui/cx';
import { formatDate, formatDateTime } from '@/lib/format';
import { isWiringProblem } from '../lib/wiring-problems';
import { sheetPinRows } from '../lib/sheet-model';
import { SheetDriversTable, SheetInputBlock, SheetExtrasTable, SheetPinTable } from './sheet-tables';
import { SheetCautions, SheetSupply } from './sheet-supply';

const TWO_COLUMNS = 'grid items-start gap-x-6 gap-y-4 sm:grid-cols-2 print:grid-cols-2';

export interface WiringSheetProps {
  robotName: string;
  teamName: string;
  revision: RevisionDetail;
  /** A photo of the robot for the bench; nothing is drawn without one. */
  photoUrl?: string;
  /** When the sheet was printed (defaults to now), for the footer. */
  printedAt?: Date;
}

/**
 * The printable wiring sheet of one revision: what goes on which pin, every driver's roles, the
 * input's wiring, supply notes and the safety cautions, on one page per robot.
 */
export function WiringSheet({ robotName, teamName, revision, photoUrl, printedAt = new Date() }: WiringSheetProps) {
  const config = revision.config;
  const board = getBoard(config.wiring.board);
  const open = robotProblems(config).filter(isWiringProblem);
  // Roles without a pin are named in one line; a fresh robot would otherwise fill the page.
  const missing = collectDemands(config)
    .filter((d) => d.required && d.pin === null)
    .map((d) => d.label);
  const others = open.filter((p) => p.code !== 'pin-missing');
  // Brick red only when something is wrong; warnings alone get the amber box.
  const hasErrors = missing.length > 0 || others.some((p) => p.severity === 'error');
  const hasRemote = config.controls.source === 'nrf24';
  const advice = powerAdvice(config);
  return (
    <article
      className="wiring-sheet mx-auto max-w-[210mm] bg-white px-[12mm] py-[10mm] text-ink shadow-[0_1px_6px_rgba(29,42,68,0.18)]"
      aria-label={`Wiring sheet of ${robotName}`}
    >
      <header className="flex items-start justify-between gap-6 border-b-2 border-ink pb-2">
        <div>
          <p className="text-[11px] font-semibold tracking-[0.18em] text-ink-muted uppercase">
            Mixwright wiring sheet · {teamName}
          </p>
          <h1 className="text-2xl leading-tight font-bold">{robotName}</h1>
          <p className="text-sm text-ink-soft">
            {board.name} ({board.name.includes(board.mcu) ? '' : `${board.mcu}, `}
            {board.logicVolts} V logic{board.fiveVoltTolerant ? '' : ', not 5 V tolerant'})
          </p>
        </div>
        <dl className="grid shrink-0 grid-cols-[auto_auto] gap-x-3 text-right text-sm">
          <dt className="text-ink-muted">Revision</dt>
          <dd className="font-mono font-semibold">{revision.number}</dd>
          <dt className="text-ink-muted">Saved</dt>
          <dd>{formatDate(revision.createdAt)}</dd>
          {revision.authorName && (
            <>
              <dt className="text-ink-muted">By</dt>
              <dd>{revision.authorName}</dd>
            </>
          )}
        </dl>
      </header>
      <p className="mt-1 text-sm text-ink-soft">
        <span className="text-ink-muted">Revision note:</span> {revision.message}
      </p>
      {photoUrl && (
        <figure data-slot="robot-photo" className="mt-3 flex justify-center">
          <img
            src={photoUrl}
            alt={`${robotName}, as built`}
            className="max-h-[55mm] rounded border border-rule-strong object-contain"
          />
        </figure>
      )}
      {open.length > 0 && (
        <section
          aria-labelledby="sheet-open-title"
          className={cx(
            'mt-3 rounded border-2 px-3 py-2 print:mt-2 print:py-1',
            hasErrors ? 'border-error' : 'border-warn',
          )}
        >
          <h2
            id="sheet-open-title"
            className={cx('text-sm font-bold', hasErrors ? 'text-error-strong' : 'text-warn-strong')}
          >
            This revision has {open.length} open wiring problem{open.length === 1 ? '' : 's'}: check before wiring
          </h2>
          <ul className="mt-1 list-disc pl-5 text-[13px]">
            {missing.length > 0 && (
              <li>
                <span className="font-semibold">Error:</span> no pin yet for {missing.join(', ')}.
              </li>
            )}
            {others.map((p, i) => (
              <li key={`${p.code}-${i}`}>
                <span className="font-semibold">{p.severity === 'error' ? 'Error' : 'Warning'}:</span> {p.message}
              </li>
            ))}
          </ul>
        </section>
      )}
      <div className="mt-3 grid gap-y-4 print:mt-2 print:gap-y-2">
        <SheetPinTable title={`Pins on the ${board.shortName}`} rows={sheetPinRows(config, 'robot')} />
        <SheetDriversTable config={config} />
        <div className={TWO_COLUMNS}>
          <div className="space-y-4 print:space-y-2">
            <SheetInputBlock config={config} side="robot" />
            <SheetExtrasTable config={config} />
          </div>
          {hasRemote ? (
            <SheetInputBlock config={config} side="remote" />
          ) : (
            <SheetSupply advice={advice} config={config} />
          )}
        </div>
        {hasRemote ? (
          <div className={TWO_COLUMNS}>
            <SheetSupply advice={advice} config={config} />
            <SheetCautions />
          </div>
        ) : (
          <SheetCautions wide />
        )}
      </div>
      <footer className="mt-3 flex justify-between border-t border-rule-strong pt-1 text-[11px] text-ink-muted">
        <span>
          {robotName} · revision {revision.number}
        </span>
        <span>Printed {formatDateTime(printedAt.toISOString())}</span>
      </footer>
    </article>
  );
}
