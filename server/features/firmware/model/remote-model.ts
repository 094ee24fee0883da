import type { RobotConfig } from '@shared/schemas/robot-config';
import { rateSwitchPositions } from '@shared/shaping/switches';
import { LINK_CHANNEL_COUNT } from '../link-packet';
import { findPin, getBoard } from '@shared/boards/boards';
import { IssueList } from './firmware-config-error';
import { CORE_NAMES, type FirmwareModel } from './firmware-model';
import { PinRegistry, type PinEntry } from './pin-registry';

export interface RemoteModel {
  board: { id: string; name: string; core: string };
  pins: PinEntry[];
  channels: { number: number; index: number; pinMacro: string; analog: boolean }[];
  nrf: NonNullable<FirmwareModel['input']['nrf']>;
  sendIntervalMs: number;
  sendRateHz: number;
}

function twoPositionSwitches(config: RobotConfig): Set<number> {
  const { rateSwitch, armingSwitch } = config.controls;
  const result = new Set<number>();
  if (armingSwitch.channel !== null) result.add(armingSwitch.channel);
  if (rateSwitch.channel !== null && rateSwitchPositions(rateSwitch) === 2) result.add(rateSwitch.channel);
  return result;
}

/** The remote's sketch data; the link settings are the robot's own (same address, channel, rate). */
export function buildRemoteModel(config: RobotConfig, robot: FirmwareModel): RemoteModel {
  const issues = new IssueList();
  const link = config.controls.link;
  const board = getBoard(link.remoteBoard);
  const pins = new PinRegistry(board, issues);
  // The pin plan places the remote's roles too (controls.link.remotePins).
  const chosen = (role: string) => link.remotePins[role]?.pin ?? null;
  pins.use(
    chosen('ce'),
    ['controls', 'link', 'remotePins', 'ce', 'pin'],
    'MW_PIN_NRF_CE',
    'transceiver CE',
    'remote nRF24L01+',
  );
  pins.use(
    chosen('csn'),
    ['controls', 'link', 'remotePins', 'csn', 'pin'],
    'MW_PIN_NRF_CSN',
    'transceiver CSN',
    'remote nRF24L01+',
  );
  pins.use(board.spi.sck, ['controls', 'link'], 'MW_PIN_NRF_SCK', 'transceiver SCK (SPI clock)', 'remote nRF24L01+');
  pins.use(board.spi.mosi, ['controls', 'link'], 'MW_PIN_NRF_MOSI', 'transceiver MOSI', 'remote nRF24L01+');
  pins.use(board.spi.miso, ['controls', 'link'], 'MW_PIN_NRF_MISO', 'transceiver MISO', 'remote nRF24L01+');
  const switches = twoPositionSwitches(config);
  const channels: RemoteModel['channels'] = [];
  const listed = [...config.controls.channels]
    .filter((c) => c.number <= LINK_CHANNEL_COUNT)
    .sort((a, b) => a.number - b.number);
  for (const channel of listed) {
    const isSwitch = switches.has(channel.number);
    const macro = `MW_PIN_CH${channel.number}`;
    const what = isSwitch
      ? `switch for channel ${channel.number} (to ground)`
      : `stick or knob for channel ${channel.number} (wiper)`;
    const entry = pins.use(
      chosen(`ch${channel.number}`),
      ['controls', 'link', 'remotePins', `ch${channel.number}`, 'pin'],
      macro,
      what,
      'remote',
    );
    if (!entry) continue;
    const pin = findPin(board, entry.pinId)!;
    if (!pin.analogIn && !pin.digital)
      issues.add(['controls', 'link', 'remotePins', `ch${channel.number}`, 'pin'], `Pin ${pin.label} cannot be read`);
    channels.push({
      number: channel.number,
      index: channel.number - 1,
      pinMacro: macro,
      analog: pin.analogIn && !(isSwitch && pin.digital),
    });
  }
  issues.throwIfAny();
  return {
    board: { id: board.id, name: board.name, core: CORE_NAMES[board.family] },
    pins: pins.entries,
    channels,
    nrf: robot.input.nrf!,
    sendIntervalMs: Math.max(1, Math.round(1000 / link.sendRateHz)),
    sendRateHz: link.sendRateHz,
  };
}
