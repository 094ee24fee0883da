import { findPin, getBoard } from '@shared/boards/boards';
import { collectDemands, type PinDemand } from '@shared/pins/pin-demands';
import type { BoardId } from '@shared/schemas/ids';
import type { PinAssignment, RobotConfig } from '@shared/schemas/robot-config';

export interface ClearedPin {
  /** The role as a sentence names it: "Driver 1 A PWM". */
  label: string;
  pin: string;
}

export interface BoardChange {
  config: RobotConfig;
  /** Pins the new board does not have: cleared (and unlocked) so the roles can be placed again. */
  cleared: ClearedPin[];
  /** Pins kept because the new board has a pin with the same id. */
  kept: number;
}

type Side = PinDemand['side'];

function labelFor(demands: PinDemand[], side: Side, match: (d: PinDemand) => boolean, fallback: string): string {
  return demands.find((d) => d.side === side && match(d))?.label ?? fallback;
}

/** Clears the pins of one record that the board lacks, counting what it keeps and clears. */
function sweep(
  record: Record<string, PinAssignment>,
  board: BoardId,
  label: (roleId: string) => string,
  tally: { kept: number; cleared: ClearedPin[] },
) {
  const profile = getBoard(board);
  return Object.fromEntries(
    Object.entries(record).map(([roleId, a]) => {
      if (a.pin === null) return [roleId, a];
      if (findPin(profile, a.pin)) {
        tally.kept += 1;
        return [roleId, a];
      }
      tally.cleared.push({ label: label(roleId), pin: a.pin });
      return [roleId, { pin: null, locked: false }];
    }),
  );
}

/**
 * The robot on another board. Every role stays; a pin the new board also has (same id) stays
 * where it is, and a pin it lacks is cleared, so the check and the assignment can place it again.
 */
export function changeBoard(config: RobotConfig, board: BoardId): BoardChange {
  const demands = collectDemands(config);
  const tally = { kept: 0, cleared: [] as ClearedPin[] };
  const drivers = config.wiring.drivers.map((driver, index) => ({
    ...driver,
    pins: sweep(
      driver.pins,
      board,
      (roleId) =>
        labelFor(demands, 'robot', (d) => d.driverIndex === index && d.roleId === roleId, `${driver.name} ${roleId}`),
      tally,
    ),
  }));
  const inputPins = sweep(
    config.wiring.inputPins,
    board,
    (roleId) => labelFor(demands, 'robot', (d) => d.owner === 'input' && d.roleId === roleId, roleId),
    tally,
  );
  const singles = sweep(
    { 'status-led': config.wiring.statusLed, 'bench-test': config.wiring.benchTestPin },
    board,
    (key) => (key === 'status-led' ? 'status LED' : 'bench-test switch'),
    tally,
  );
  return {
    config: {
      ...config,
      wiring: {
        ...config.wiring,
        board,
        drivers,
        inputPins,
        statusLed: singles['status-led'],
        benchTestPin: singles['bench-test'],
      },
    },
    ...tally,
  };
}

/** The handheld remote on another board (home-made link): the same rule for the remote's pins. */
export function changeRemoteBoard(config: RobotConfig, board: BoardId): BoardChange {
  const demands = collectDemands(config);
  const tally = { kept: 0, cleared: [] as ClearedPin[] };
  const link = config.controls.link;
  const remotePins = sweep(
    link.remotePins,
    board,
    (roleId) => labelFor(demands, 'remote', (d) => d.roleId === roleId, `remote ${roleId}`),
    tally,
  );
  return {
    config: { ...config, controls: { ...config.controls, link: { ...link, remoteBoard: board, remotePins } } },
    ...tally,
  };
}

/** What the board chooser says after a change, in one or two sentences. */
export function boardChangeMessage(change: BoardChange, boardName: string, who: 'robot' | 'remote' = 'robot'): string {
  const head = `${who === 'robot' ? 'The robot' : 'The remote'} is now on the ${boardName}. Every role is kept`;
  if (change.cleared.length === 0) {
    return change.kept === 0
      ? `${head}; no pins were set yet.`
      : `${head}, and all ${change.kept} pins exist on this board too, so they stay.`;
  }
  const list = change.cleared.map((c) => `${c.pin} (${c.label})`).join(', ');
  const kept = change.kept > 0 ? ` ${change.kept} other pin${change.kept === 1 ? '' : 's'} stay.` : '';
  return `${head}; the ${boardName} has no ${list}, so ${change.cleared.length === 1 ? 'that pin was' : 'those pins were'} cleared.${kept} Choose new pins, or use “Assign free pins”.`;
}
