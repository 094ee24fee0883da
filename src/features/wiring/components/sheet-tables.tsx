import { Fragment, type ReactNode } from 'react';
import type { PlanSide } from '@shared/pins/pin-demands';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { sheetDrivers, sheetExtras, sheetInput, type SheetPinRow } from '../lib/sheet-model';
import { Cell, PinCells, SheetTable } from './sheet-table';

function SheetSection({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id}>
      <h2 id={id} className="mb-1 text-[15px] font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** Every used pin of a board, in the board's order, with what connects to it; two columns when long. */
export function SheetPinTable({ title, rows }: { title: string; rows: SheetPinRow[] }) {
  const id = `sheet-pins-${title.replace(/\W+/g, '-').toLowerCase()}`;
  const halves =
    rows.length > 8 ? [rows.slice(0, Math.ceil(rows.length / 2)), rows.slice(Math.ceil(rows.length / 2))] : [rows];
  return (
    <SheetSection id={id} title={title}>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-muted">No pins are set yet.</p>
      ) : (
        <div className="grid items-start gap-x-5 gap-y-2 sm:grid-cols-2 print:grid-cols-2">
          {halves.map((half, i) => (
            <SheetTable
              key={i}
              caption={halves.length > 1 ? `${title}, part ${i + 1} of 2` : title}
              head={['Pin', 'Code', 'Connects to', 'Used as']}
              className={halves.length === 1 ? 'sm:col-span-2 print:col-span-2' : undefined}
            >
              {half.map((row) => (
                <tr key={row.pin.id}>
                  <Cell mono className="font-medium whitespace-nowrap">
                    {row.pin.id}
                    {row.pin.label !== null && row.pin.label !== row.pin.id && row.pin.label !== row.pin.code && (
                      <span className="font-normal text-ink-muted"> “{row.pin.label}”</span>
                    )}
                  </Cell>
                  <Cell mono>{row.pin.code ?? '—'}</Cell>
                  <Cell className="font-semibold">{row.roles.join(' + ')}</Cell>
                  <Cell className="text-ink-soft">{row.note}</Cell>
                </tr>
              ))}
            </SheetTable>
          ))}
        </div>
      )}
    </SheetSection>
  );
}

/** Each driver's roles with their pins, its channels' motors, and how it stops and runs PWM. */
export function SheetDriversTable({ config }: { config: RobotConfig }) {
  const drivers = sheetDrivers(config);
  return (
    <SheetSection id="sheet-drivers" title="Motor drivers">
      <SheetTable caption="Motor drivers" head={['Channel', 'Motor', 'Role', 'Pin', 'Printed', 'Code']}>
        {drivers.map((driver) => (
          <Fragment key={driver.name}>
            <tr className="border-t-2 border-ink-soft bg-paper-sunken/60">
              <th scope="rowgroup" colSpan={6} className="px-1.5 py-1 text-left font-normal">
                <span className="font-semibold">{driver.name}</span>{' '}
                <span className="text-ink-soft">· {driver.kind}</span>{' '}
                <span className="text-[12px] text-ink-muted">
                  · stop: {driver.stop} · PWM: {driver.pwm} · rated {driver.ratings}
                </span>
              </th>
            </tr>
            {driver.roles.map((role) => (
              <tr key={`${driver.name}-${role.channel}-${role.role}`}>
                <Cell mono>{role.channel ?? 'chip'}</Cell>
                <Cell>{role.motor ?? '—'}</Cell>
                <Cell>
                  {role.role}
                  {role.optional && <span className="text-ink-muted"> (optional)</span>}
                </Cell>
                <PinCells pin={role.pin} />
              </tr>
            ))}
          </Fragment>
        ))}
      </SheetTable>
    </SheetSection>
  );
}

/** The receiver's or the transceiver's wires (robot side), or the handheld remote's. */
export function SheetInputBlock({ config, side }: { config: RobotConfig; side: PlanSide }) {
  const input = sheetInput(config, side);
  const title = side === 'robot' ? `Input: ${input.source}` : `Handheld remote (${input.board})`;
  return (
    <SheetSection id={`sheet-input-${side}`} title={title}>
      <SheetTable caption={title} head={['Wire', 'Pin', 'Printed', 'Code']}>
        {input.rows.map((row) => (
          <tr key={row.role}>
            <Cell>{row.role}</Cell>
            <PinCells pin={row.pin} />
          </tr>
        ))}
      </SheetTable>
      {side === 'robot' && input.notes.length > 0 && (
        <ul className="mt-1 text-[12px] text-ink-soft">
          {input.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </SheetSection>
  );
}

export function SheetExtrasTable({ config }: { config: RobotConfig }) {
  const rows = sheetExtras(config);
  return (
    <SheetSection id="sheet-extras" title="Status LED and bench test">
      <SheetTable caption="Status LED and bench test" head={['Part', 'Pin', 'Printed', 'Code']}>
        {rows.map((row) => (
          <tr key={row.role}>
            <Cell>
              {row.role}
              <span className="block text-[12px] text-ink-muted">{row.note}</span>
            </Cell>
            {row.pin.id === null ? (
              <>
                <Cell className="text-ink-muted">not connected</Cell>
                <Cell>—</Cell>
                <Cell>—</Cell>
              </>
            ) : (
              <PinCells pin={row.pin} />
            )}
          </tr>
        ))}
      </SheetTable>
    </SheetSection>
  );
}
