/**
 * Names of configuration fields in words, with their units, for diffs, conflict dialogs and
 * history. Keys are the field names of RobotConfigSchema; an unknown key is spelled out from
 * its camelCase name, so a field added later still reads sensibly.
 */
export const FIELD_WORDS: Record<string, { label: string; unit?: string }> = {
  schemaVersion: { label: 'file format version' },
  name: { label: 'name' },
  chassis: { label: 'chassis' },
  motors: { label: 'motors' },
  controls: { label: 'controls' },
  wiring: { label: 'wiring' },
  safety: { label: 'safety' },
  power: { label: 'power' },
  firmware: { label: 'firmware' },
  // Chassis
  layout: { label: 'drive layout' },
  params: { label: 'layout parameters' },
  wheels: { label: 'wheels' },
  kind: { label: 'kind' },
  xMm: { label: 'x (ahead of centre)', unit: 'mm' },
  yMm: { label: 'y (left of centre)', unit: 'mm' },
  driveAngleDeg: { label: 'driving direction', unit: '°' },
  rollerAngleDeg: { label: 'roller angle', unit: '°' },
  radiusMm: { label: 'radius', unit: 'mm' },
  motor: { label: 'motor' },
  reversed: { label: 'reversed' },
  maxRpm: { label: 'top speed', unit: 'rpm' },
  startThreshold: { label: 'start threshold (duty)' },
  stallCurrentA: { label: 'stall current', unit: 'A' },
  ratedVoltage: { label: 'rated voltage', unit: 'V' },
  // Controls
  source: { label: 'input source' },
  channels: { label: 'channels' },
  number: { label: 'channel number' },
  low: { label: 'low end' },
  centre: { label: 'centre' },
  high: { label: 'high end' },
  axes: { label: 'stick map' },
  forward: { label: 'forward' },
  strafe: { label: 'strafe' },
  yaw: { label: 'yaw' },
  channel: { label: 'channel' },
  reverse: { label: 'reverse' },
  deadband: { label: 'deadband' },
  expo: { label: 'expo' },
  rate: { label: 'rate' },
  rateSwitch: { label: 'rate switch' },
  positions: { label: 'positions' },
  rates: { label: 'rates' },
  armingSwitch: { label: 'arming switch' },
  armedWhen: { label: 'armed when' },
  desaturation: { label: 'over-100 % handling' },
  link: { label: '2.4 GHz link' },
  rfChannel: { label: 'RF channel' },
  dataRate: { label: 'data rate' },
  address: { label: 'address' },
  sendRateHz: { label: 'send rate', unit: 'Hz' },
  remoteBoard: { label: 'remote board' },
  remotePins: { label: 'remote pins' },
  // Wiring
  board: { label: 'board' },
  drivers: { label: 'drivers' },
  pins: { label: 'pins' },
  pin: { label: 'pin' },
  locked: { label: 'locked' },
  inputPins: { label: 'input pins' },
  statusLed: { label: 'status LED' },
  benchTestPin: { label: 'bench-test pin' },
  pwmFrequencyHz: { label: 'PWM frequency', unit: 'Hz' },
  stopMode: { label: 'stop mode' },
  continuousCurrentA: { label: 'continuous current', unit: 'A' },
  peakCurrentA: { label: 'peak current', unit: 'A' },
  // Safety and power
  failsafeTimeoutMs: { label: 'failsafe timeout', unit: 'ms' },
  rampPerSecond: { label: 'ramp limit', unit: 'full scale/s' },
  outputLimitPercent: { label: 'output limit', unit: '%' },
  armingRequired: { label: 'arming required' },
  reverseDwellMs: { label: 'reverse dwell', unit: 'ms' },
  startupValidFrames: { label: 'good frames before start' },
  centreTolerance: { label: 'centre tolerance' },
  chemistry: { label: 'battery chemistry' },
  cells: { label: 'cells in series' },
  capacityMah: { label: 'capacity', unit: 'mAh' },
  dischargeC: { label: 'discharge rating', unit: 'C' },
  logicSupply: { label: 'logic supply' },
  // Firmware
  sketchName: { label: 'sketch name' },
  serialDiagnostics: { label: 'serial diagnostics' },
  serialBaud: { label: 'serial speed', unit: 'baud' },
  diagnosticsIntervalMs: { label: 'diagnostics interval', unit: 'ms' },
  benchTestDuty: { label: 'bench-test duty' },
  benchTestMs: { label: 'bench-test time per motor', unit: 'ms' },
};

/** "pwmFrequencyHz" → "pwm frequency hz" for keys not in the table. */
export function spellKey(key: string): string {
  return key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[-_]/g, ' ')
    .toLowerCase();
}

// Units read from a key's ending, for keys not in the table (a starter layout's parameters).
const UNIT_SUFFIXES: [RegExp, string][] = [
  [/Mm$/, 'mm'],
  [/Deg$/, '°'],
  [/Ms$/, 'ms'],
  [/Hz$/, 'Hz'],
  [/Rpm$/, 'rpm'],
];

export function fieldWords(key: string): { label: string; unit?: string } {
  if (FIELD_WORDS[key]) return FIELD_WORDS[key];
  const suffix = UNIT_SUFFIXES.find(([pattern]) => pattern.test(key));
  if (suffix) return { label: spellKey(key.replace(suffix[0], '')), unit: suffix[1] };
  return { label: spellKey(key) };
}
