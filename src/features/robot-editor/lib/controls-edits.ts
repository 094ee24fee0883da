import { INPUT_SOURCES, inputPinRoles } from '@shared/inputs/input-sources';
import type { InputSourceId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';

// Edits of the controls that touch more than one field: channel numbers are referred to by
// the stick map and the switches, and the input source decides which pins the board needs.

/** The input pins the source needs for the channel table: kept where the role stays, new ones unassigned. */
export function fitInputPins(config: RobotConfig): RobotConfig {
  const roles = inputPinRoles(
    config.controls.source,
    config.controls.channels.map((c) => c.number),
  );
  const old = config.wiring.inputPins;
  const inputPins = Object.fromEntries(roles.map((r) => [r.id, old[r.id] ?? { pin: null, locked: false }]));
  return { ...config, wiring: { ...config.wiring, inputPins } };
}

/**
 * A new input source. Its units differ, so every channel starts from the new source's default
 * calibration (calibrate again with the new receiver); channel numbers and the stick map stay.
 */
export function changeSource(config: RobotConfig, source: InputSourceId): RobotConfig {
  if (source === config.controls.source) return config;
  const calibration = INPUT_SOURCES[source].defaultCalibration;
  const channels = config.controls.channels.map((c) => ({ ...c, ...calibration }));
  return fitInputPins({ ...config, controls: { ...config.controls, source, channels } });
}

/** The lowest channel number the source carries that is not in the table yet, or null. */
export function nextFreeChannel(config: RobotConfig): number | null {
  const taken = new Set(config.controls.channels.map((c) => c.number));
  for (let n = 1; n <= INPUT_SOURCES[config.controls.source].maxChannels; n += 1) if (!taken.has(n)) return n;
  return null;
}

export function addChannel(config: RobotConfig): RobotConfig {
  const number = nextFreeChannel(config);
  if (number === null) return config;
  const channel = { number, name: `Channel ${number}`, ...INPUT_SOURCES[config.controls.source].defaultCalibration };
  const channels = [...config.controls.channels, channel].sort((a, b) => a.number - b.number);
  return fitInputPins({ ...config, controls: { ...config.controls, channels } });
}

/** Removes a channel; whatever used it (a stick, a switch) is left without a channel. */
export function removeChannel(config: RobotConfig, index: number): RobotConfig {
  const gone = config.controls.channels[index]?.number;
  if (gone === undefined) return config;
  return fitInputPins(
    renumberRefs(
      { ...config, controls: { ...config.controls, channels: config.controls.channels.filter((_, i) => i !== index) } },
      gone,
      null,
    ),
  );
}

export type RenumberResult = { ok: true; config: RobotConfig } | { ok: false; reason: string };

/** Gives a channel another number; the stick map and switches that used it follow. */
export function renumberChannel(config: RobotConfig, index: number, number: number): RenumberResult {
  const channel = config.controls.channels[index];
  if (!channel || channel.number === number) return { ok: true, config };
  if (!Number.isInteger(number) || number < 1 || number > 18)
    return { ok: false, reason: 'Channel numbers are whole numbers from 1 to 18' };
  if (config.controls.channels.some((c, i) => i !== index && c.number === number))
    return { ok: false, reason: `Channel ${number} is already in the table` };
  const channels = config.controls.channels.map((c, i) => (i === index ? { ...c, number } : c));
  // A number beyond what the source carries is allowed: the engine's check explains it.
  return {
    ok: true,
    config: fitInputPins(
      renumberRefs({ ...config, controls: { ...config.controls, channels } }, channel.number, number),
    ),
  };
}

function renumberRefs(config: RobotConfig, from: number, to: number | null): RobotConfig {
  const c = config.controls;
  const move = (n: number | null) => (n === from ? to : n);
  return {
    ...config,
    controls: {
      ...c,
      axes: {
        forward: { ...c.axes.forward, channel: move(c.axes.forward.channel) },
        strafe: { ...c.axes.strafe, channel: move(c.axes.strafe.channel) },
        yaw: { ...c.axes.yaw, channel: move(c.axes.yaw.channel) },
      },
      rateSwitch: { ...c.rateSwitch, channel: move(c.rateSwitch.channel) },
      armingSwitch: { ...c.armingSwitch, channel: move(c.armingSwitch.channel) },
    },
  };
}

/** The rate switch with 2 or 3 positions: the rates list follows, keeping the top rate. */
export function setRatePositions(config: RobotConfig, positions: 2 | 3): RobotConfig {
  const old = config.controls.rateSwitch;
  if (old.rates.length === positions) return config;
  const top = old.rates[old.rates.length - 1] ?? 1;
  const rates =
    positions === 2
      ? [old.rates[0] ?? 0.5, top]
      : [old.rates[0] ?? 0.4, Math.round(((old.rates[0] ?? 0.4) + top) * 50) / 100, top];
  return { ...config, controls: { ...config.controls, rateSwitch: { ...old, rates } } };
}

/** Five random bytes as 10 hexadecimal digits: a pipe address unlikely to match another robot's. */
export function randomLinkAddress(
  random: (bytes: Uint8Array) => Uint8Array = (b) => crypto.getRandomValues(b),
): string {
  return [...random(new Uint8Array(5))]
    .map((b) => b.toString(16).padStart(2, '0'))
    .join('')
    .toUpperCase();
}
