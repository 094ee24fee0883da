import type { InputSourceId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { addressBytes, robotTagOf } from '../link-packet';
import { nrfRegisterSettings } from '../nrf24-settings';
import type { IssueList } from './firmware-config-error';
import { uartModel, type UartModel } from './uart-model';
import type { PinRegistry } from './pin-registry';

const hex2 = (n: number) => `0x${n.toString(16).toUpperCase().padStart(2, '0')}`;

/** Sane raw readings per source: pulses 800–2200 µs (common practice), SBUS 11 bits, link 10 bits. */
export const RAW_RANGE: Record<InputSourceId, [number, number]> = {
  'rc-pwm': [800, 2200],
  ppm: [800, 2200],
  ibus: [800, 2200],
  sbus: [0, 2047],
  nrf24: [0, 1023],
};

const DECODERS: Record<InputSourceId, { header: string; type: string; prefix: string }> = {
  'rc-pwm': { header: 'mw_rc_pulse.h', type: 'MwRcPulseDecoder', prefix: 'mw_rc' },
  ppm: { header: 'mw_ppm.h', type: 'MwPpmDecoder', prefix: 'mw_ppm' },
  sbus: { header: 'mw_sbus.h', type: 'MwSbusDecoder', prefix: 'mw_sbus' },
  ibus: { header: 'mw_ibus.h', type: 'MwIbusDecoder', prefix: 'mw_ibus' },
  // The nRF24L01+ driver itself is included after the SPI hooks it calls (mw_input.h).
  nrf24: { header: 'mw_link_packet.h', type: 'MwLinkPacket', prefix: 'mw_link' },
};

export interface RcChannelModel {
  slot: number;
  pinMacro: string;
  usePcint: boolean;
}

export interface InputModel {
  source: InputSourceId;
  title: string;
  decoderHeader: string;
  decoderType: string;
  decoderPrefix: string;
  rawMin: number;
  rawMax: number;
  isRcPwm: boolean;
  isPpm: boolean;
  isSbus: boolean;
  isIbus: boolean;
  isNrf24: boolean;
  uart: UartModel | null;
  ppm: { needed: number } | null;
  rc: { count: number; pinMacros: string[]; channels: RcChannelModel[]; pcintGroups: number[] } | null;
  nrf: { channel: number; rfSetup: string; setupRetr: string; address: string[]; robotTag: string } | null;
}

/** Channel numbers the firmware reads (axes and switches), lowest first. */
export function usedChannelNumbers(config: RobotConfig): number[] {
  const { axes, rateSwitch, armingSwitch } = config.controls;
  const numbers = [
    axes.forward.channel,
    axes.strafe.channel,
    axes.yaw.channel,
    rateSwitch.channel,
    armingSwitch.channel,
  ];
  return [...new Set(numbers.filter((n): n is number => n !== null))].sort((a, b) => a - b);
}

export function buildInputModel(config: RobotConfig, pins: PinRegistry, issues: IssueList): InputModel {
  const source = config.controls.source;
  const used = usedChannelNumbers(config);
  const spec = INPUT_SOURCES[source];
  for (const number of used) {
    if (number > spec.maxChannels) {
      const index = config.controls.channels.findIndex((c) => c.number === number);
      issues.add(
        ['controls', 'channels', index, 'number'],
        `${spec.name} carries channels 1 to ${spec.maxChannels}, not ${number}`,
      );
    }
  }
  const decoder = DECODERS[source];
  const [rawMin, rawMax] = RAW_RANGE[source];
  return {
    source,
    title: spec.name,
    decoderHeader: decoder.header,
    decoderType: decoder.type,
    decoderPrefix: decoder.prefix,
    rawMin,
    rawMax,
    isRcPwm: source === 'rc-pwm',
    isPpm: source === 'ppm',
    isSbus: source === 'sbus',
    isIbus: source === 'ibus',
    isNrf24: source === 'nrf24',
    uart: source === 'sbus' || source === 'ibus' ? uartModel(config, source, pins, issues) : null,
    ppm: source === 'ppm' ? ppmModel(config, used, pins) : null,
    rc: source === 'rc-pwm' ? rcModel(config, used, pins, issues) : null,
    nrf: source === 'nrf24' ? nrfModel(config, pins) : null,
  };
}

function inputPin(config: RobotConfig, role: string): string | null {
  return config.wiring.inputPins[role]?.pin ?? null;
}

function ppmModel(config: RobotConfig, used: number[], pins: PinRegistry): InputModel['ppm'] {
  pins.use(inputPin(config, 'ppm'), ['wiring', 'inputPins', 'ppm', 'pin'], 'MW_PIN_PPM', 'the PPM signal', 'receiver');
  return { needed: Math.max(1, ...used) };
}

function rcModel(config: RobotConfig, used: number[], pins: PinRegistry, issues: IssueList): InputModel['rc'] {
  const channels: RcChannelModel[] = [];
  used.forEach((number, slot) => {
    const macro = `MW_PIN_CH${number}`;
    const path = ['wiring', 'inputPins', `ch${number}`, 'pin'];
    const entry = pins.use(inputPin(config, `ch${number}`), path, macro, `channel ${number} pulses`, 'receiver');
    if (!entry) return;
    const usePcint = pins.board.family === 'avr' && entry.pin.pinChange === true;
    if (!usePcint && entry.pin.externalInterrupt === undefined) {
      issues.add(path, `Pin ${entry.pin.label} has no interrupt to time channel ${number}'s pulses`);
    }
    channels.push({ slot, pinMacro: macro, usePcint });
  });
  return {
    count: channels.length,
    pinMacros: channels.map((c) => c.pinMacro),
    channels,
    pcintGroups: channels.some((c) => c.usePcint) ? [0, 1, 2] : [],
  };
}

function nrfModel(config: RobotConfig, pins: PinRegistry): InputModel['nrf'] {
  const { link } = config.controls;
  pins.use(
    inputPin(config, 'ce'),
    ['wiring', 'inputPins', 'ce', 'pin'],
    'MW_PIN_NRF_CE',
    'transceiver CE',
    'nRF24L01+',
  );
  pins.use(
    inputPin(config, 'csn'),
    ['wiring', 'inputPins', 'csn', 'pin'],
    'MW_PIN_NRF_CSN',
    'transceiver CSN',
    'nRF24L01+',
  );
  const bus = pins.board.spi;
  pins.use(bus.sck, ['wiring'], 'MW_PIN_NRF_SCK', 'transceiver SCK (SPI clock)', 'nRF24L01+');
  pins.use(bus.mosi, ['wiring'], 'MW_PIN_NRF_MOSI', 'transceiver MOSI', 'nRF24L01+');
  pins.use(bus.miso, ['wiring'], 'MW_PIN_NRF_MISO', 'transceiver MISO', 'nRF24L01+');
  const registers = nrfRegisterSettings(link);
  return {
    channel: link.rfChannel,
    rfSetup: hex2(registers.rfSetup),
    setupRetr: hex2(registers.setupRetr),
    address: addressBytes(link.address).map(hex2),
    robotTag: `0x${robotTagOf(link.address).toString(16).toUpperCase().padStart(4, '0')}u`,
  };
}
