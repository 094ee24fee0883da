import { useState } from 'react';
import { BOARDS, getBoard } from '@shared/boards/boards';
import type { BoardProfile } from '@shared/boards/board-types';
import { BOARD_IDS, type BoardId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { boardChangeMessage, changeBoard } from '../lib/change-board';
import { fieldDomId } from '../lib/wiring-problems';

/** One line of what matters about a board for its pins. */
export function boardFacts(board: BoardProfile): string {
  const pwm = board.pins.filter((p) => p.pwm && p.onHeader).length;
  const units = board.pwmUnits;
  const pwmWords =
    units.kind === 'avr-timers'
      ? `${pwm} PWM pins on ${board.timers.length} timers`
      : units.kind === 'ledc'
        ? `PWM on ${pwm} pins through ${units.channels} LEDC channels`
        : `PWM on every pin, ${units.slices} slices × 2 channels`;
  return `${board.mcu} · ${board.logicVolts} V logic${board.fiveVoltTolerant ? '' : ', not 5 V tolerant'} · ${pwmWords}`;
}

/** The robot's board. A change keeps every role and clears only pins the new board lacks, and says so. */
export function BoardChooser({
  config,
  canEdit,
  onChange,
}: {
  config: RobotConfig;
  canEdit: boolean;
  onChange: (next: RobotConfig) => void;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const id = fieldDomId(['wiring', 'board']);
  const board = getBoard(config.wiring.board);
  const choose = (next: BoardId) => {
    const change = changeBoard(config, next);
    onChange(change.config);
    setMessage(boardChangeMessage(change, getBoard(next).shortName));
  };
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
          Board
        </label>
        <select
          id={id}
          data-field="wiring.board"
          value={config.wiring.board}
          disabled={!canEdit}
          onChange={(e) => choose(e.target.value as BoardId)}
          className="h-9 rounded-md border border-rule-strong bg-paper-raised px-2 font-semibold text-ink disabled:bg-paper-sunken"
        >
          {BOARD_IDS.map((b) => (
            <option key={b} value={b}>
              {BOARDS[b].name}
            </option>
          ))}
        </select>
        <span className="text-sm text-ink-muted">{boardFacts(board)}</span>
      </div>
      {message && (
        <p
          role="status"
          className="rounded-md border border-accent/30 bg-accent-soft px-3 py-1.5 text-sm text-accent-strong"
        >
          {message}
        </p>
      )}
    </div>
  );
}
