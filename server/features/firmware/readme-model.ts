import type { RobotConfig } from '@shared/schemas/robot-config';
import { markdownText } from './c-text';
import type { FirmwareModel } from './model/firmware-model';
import type { PinEntry } from './model/pin-registry';
import type { RemoteModel } from './model/remote-model';

interface Row {
  part: string;
  connects: string;
  pin: string;
}

const wiringRows = (entries: PinEntry[]): Row[] =>
  entries.map((e) => ({
    part: markdownText(e.part),
    connects: markdownText(e.connects),
    pin: `${markdownText(e.pinLabel)} (\`${e.code}\` in code)`,
  }));

function describe(path: string): string {
  if (path.endsWith('.ino'))
    return path.includes('_remote/') ? 'the remote transmitter sketch' : 'the robot sketch: set-up and control loop';
  const known: Record<string, string> = {
    'mw_config.h': 'every number and pin from the configuration',
    'mw_remote_config.h': "the remote's pins and link settings",
    'mw_platform.h': 'board support: PWM, servo pulses, console port',
    'mw_frame.h': 'decoder verdicts',
    'mw_mixer.h': 'shaping, mixing, desaturation, ramp and output limit',
    'mw_safety.h': 'failsafe, start-up rule, arming, link health counters',
    'mw_input.h': 'reading the receiver',
    'mw_outputs.h': 'motor outputs and the reverse dwell',
    'mw_console.h': 'boot line, health lines, bench test, commands',
    'mw_status.h': 'status LED',
    'mw_nrf24.h': 'nRF24L01+ driver',
    'mw_link_packet.h': 'the link packet shared with the remote',
    'config.json': 'the exact configuration (import it into Mixwright)',
  };
  const name = path.split('/').pop() ?? path;
  if (known[name]) return known[name];
  if (name.startsWith('mw_driver_')) return 'motor driver';
  return 'input decoder';
}

/** README data: every user string escaped for Markdown, every number formatted here. */
export function buildReadmeModel(
  config: RobotConfig,
  model: FirmwareModel,
  remote: RemoteModel | null,
  folder: string,
  remoteFolder: string,
  files: { path: string }[],
) {
  const brakes = config.wiring.drivers.every((d) => d.stopMode === 'brake');
  const coasts = config.wiring.drivers.every((d) => d.stopMode === 'coast');
  return {
    robotName: markdownText(config.name),
    sketchFolder: folder,
    remoteFolder,
    files: [
      ...files.map((f) => ({ path: f.path, what: describe(f.path) })),
      { path: 'README.md', what: 'this file' },
      { path: 'manifest.json', what: 'file list with SHA-256 digests, revision and generator version' },
    ],
    wiring: wiringRows(model.pins),
    remoteWiring: remote ? wiringRows(remote.pins) : [],
    notes: model.notes.map(markdownText),
    hasArming: model.arming.slot >= 0,
    benchPossible: model.serial.commands || model.bench.pinPresent,
    desaturation:
      config.controls.desaturation === 'scale'
        ? 'all motors scaled together, keeping the direction of travel'
        : 'each motor clipped at full',
    rampPerSecond: config.safety.rampPerSecond,
    outputLimitPercent: config.safety.outputLimitPercent,
    stopWords: brakes ? 'braked' : coasts ? 'left to coast' : 'braked or left to coast (as each driver is set)',
  };
}
