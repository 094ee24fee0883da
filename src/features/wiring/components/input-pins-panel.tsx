import { BOARDS, getBoard } from '@shared/boards/boards';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import type { PinDemand } from '@shared/pins/pin-demands';
import { BOARD_IDS, type BoardId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { useState } from 'react';
import { Panel } from '@/components/ui/panel';
import { boardChangeMessage, changeRemoteBoard } from '../lib/change-board';
import { fieldDomId } from '../lib/wiring-problems';
import { RolePickers, roleLabel, type RolePickersProps } from './role-pickers';

type Shared = Omit<RolePickersProps, 'demands' | 'labelOf'>;

/** The input source's pins on the robot; the source itself is chosen in Controls. */
export function InputPinsPanel({ config, demands, ...shared }: Shared & { config: RobotConfig; demands: PinDemand[] }) {
  const source = INPUT_SOURCES[config.controls.source];
  const board = getBoard(config.wiring.board);
  const inputs = demands.filter((d) => d.owner === 'input');
  const notes = [
    source.serial &&
      `${source.serial.baud} baud, ${source.serial.format}${source.serial.inverted ? ', sent inverted' : ''}.`,
    source.needsPart?.families.includes(board.family) && `Needs ${source.needsPart.part}: ${source.needsPart.reason}.`,
    source.usesSpi &&
      `The transceiver also takes the SPI bus: ${board.spi.sck} (SCK), ${board.spi.mosi} (MOSI) and ${board.spi.miso} (MISO).`,
  ].filter(Boolean) as string[];
  return (
    <Panel
      title={`Input: ${source.name}`}
      titleId="wiring-input-title"
      field="wiring.inputPins"
      description="The input source and its channels are chosen in Controls; here its wires meet the board."
    >
      {notes.length > 0 && (
        <ul className="mb-2 space-y-0.5 text-sm text-ink-muted">
          {notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
      <RolePickers demands={inputs} labelOf={roleLabel} {...shared} />
    </Panel>
  );
}

/** The handheld remote's board and pins, for the home-made link. */
export function RemotePinsPanel({
  config,
  demands,
  onChange,
  ...shared
}: Shared & { config: RobotConfig; demands: PinDemand[]; onChange: (next: RobotConfig) => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const remote = demands.filter((d) => d.owner === 'remote');
  const boardId = config.controls.link.remoteBoard;
  const board = getBoard(boardId);
  const selectId = fieldDomId(['controls', 'link', 'remoteBoard']);
  const choose = (id: BoardId) => {
    const change = changeRemoteBoard(config, id);
    onChange(change.config);
    setMessage(boardChangeMessage(change, getBoard(id).shortName, 'remote'));
  };
  return (
    <Panel
      title="Handheld remote"
      titleId="wiring-remote-title"
      field="controls.link.remotePins"
      description="The home-made link’s transmitter: its sticks, switches and transceiver."
    >
      <div className="mb-2 flex flex-wrap items-center gap-2">
        <label htmlFor={selectId} className="text-sm font-semibold text-ink-soft">
          Remote’s board
        </label>
        <select
          id={selectId}
          data-field="controls.link.remoteBoard"
          value={boardId}
          disabled={!shared.canEdit}
          onChange={(e) => choose(e.target.value as BoardId)}
          className="h-8 rounded-md border border-rule-strong bg-paper-raised px-2 text-sm"
        >
          {BOARD_IDS.map((id) => (
            <option key={id} value={id}>
              {BOARDS[id].name}
            </option>
          ))}
        </select>
        <span className="text-sm text-ink-muted">
          SPI bus on {board.spi.sck}, {board.spi.mosi}, {board.spi.miso}
        </span>
      </div>
      {message && (
        <p
          role="status"
          className="mb-2 rounded-md border border-accent/30 bg-accent-soft px-3 py-1.5 text-sm text-accent-strong"
        >
          {message}
        </p>
      )}
      <RolePickers demands={remote} labelOf={roleLabel} {...shared} />
    </Panel>
  );
}

/** The status LED and the optional bench-test switch. */
export function ExtraPinsPanel({ demands, ...shared }: Shared & { demands: PinDemand[] }) {
  const extras = demands.filter((d) => d.owner === 'status-led' || d.owner === 'bench-test');
  const labels: Record<string, string> = { 'status-led': 'Status LED', 'bench-test': 'Bench-test switch' };
  return (
    <Panel
      title="Status LED and bench test"
      titleId="wiring-extra-pins-title"
      description="The LED shows link and arming state. A switch to ground on the bench-test pin, held at power-up, spins each motor in turn with the wheels off the ground."
    >
      <RolePickers demands={extras} labelOf={(d) => labels[d.owner] ?? roleLabel(d)} {...shared} />
    </Panel>
  );
}
