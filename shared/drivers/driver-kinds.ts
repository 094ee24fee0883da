import type { DriverKindId } from '../schemas/ids';

/** What a pin role must be able to do. */
export type PinNeed = 'pwm' | 'digital-out' | 'servo-pulse';

export interface DriverPinRole {
  /** Role id as stored in `driver.pins`: per channel `a.pwm`, `b.in1`…, per chip `stby`. */
  id: string;
  label: string;
  need: PinNeed;
  /** May be left unconnected (for example tied high on the module). */
  optional: boolean;
  /** May share one pin with the same role on other drivers of this kind (a chip's standby). */
  shareable: boolean;
}

/** Current and voltage ratings of a driver kind (a typical part of the class). */
export interface DriverRatings {
  /** Per channel, amperes; null when it depends entirely on the module (ESCs). */
  continuousA: number | null;
  peakA: number | null;
  /** Motor supply range, volts. */
  motorVolts: { min: number; max: number } | null;
  /** Where the figures come from. */
  source: string;
}

export interface DriverLogic {
  /** Lowest voltage the inputs read as high: volts, or a fraction of the driver's logic supply. */
  minHigh: { volts: number } | { fractionOfVcc: number };
  /** Range of the driver's own logic supply, if it has one. */
  supplyVolts: { min: number; max: number } | null;
  note: string;
}

export interface DriverKind {
  id: DriverKindId;
  name: string;
  /** Highest PWM frequency the inputs accept, Hz; null for servo-pulse inputs. */
  maxPwmHz: number | null;
  maxPwmSource: string;
  ratings: DriverRatings;
  logic: DriverLogic;
  /** How the firmware brakes and coasts with this kind; null = not possible with these pins. */
  stopModes: { brake: string | null; coast: string | null };
  /** A 5 V regulator on typical modules that could feed the board, with its input limit. */
  regulator: { outputVolts: number; maxInputVolts: number; note: string } | null;
  /** Voltage lost across the bridge at about 1 A, volts (bipolar bridges). */
  bridgeDropVolts: number | null;
  /** Motor channels on one module or chip. */
  channels: 1 | 2;
  /** Roles repeated for each channel; ids get the channel prefix (`a.`, `b.`). */
  channelRoles: ChannelRoleTemplate[];
  /** Roles once per module or chip. */
  chipRoles: DriverPinRole[];
}

export interface ChannelRoleTemplate {
  key: string;
  label: string;
  need: PinNeed;
  optional: boolean;
}

export const CHANNEL_PREFIXES = ['a', 'b'] as const;

export const DRIVER_KINDS: Record<DriverKindId, DriverKind> = {
  'dual-pwm': {
    id: 'dual-pwm',
    name: 'Dual half-bridge, one PWM input per direction',
    // BTS7960-class module: PWM ≤ 25 kHz (REFERENCES §7, quoted); 6–27 V, 43 A current limit and
    // about 10 A continuous with cooling as module sellers state them (quoted). Inputs go through a
    // 74HC244 buffer powered at 5 V on common modules: 74HC high threshold 0.7 × VCC = 3.5 V (from memory).
    maxPwmHz: 25_000,
    maxPwmSource: 'half-bridge datasheet, PWM up to 25 kHz',
    ratings: {
      continuousA: 10,
      peakA: 43,
      motorVolts: { min: 6, max: 27 },
      source: 'typical module listing: 43 A limit, about 10 A continuous with cooling, 6–27 V',
    },
    logic: {
      minHigh: { volts: 3.5 },
      supplyVolts: { min: 4.5, max: 5.5 },
      note: 'inputs pass a 74HC buffer powered at 5 V on common modules; 3.3 V is below its 3.5 V high threshold',
    },
    stopModes: {
      brake: 'both PWM inputs low: both low-side switches short the motor',
      coast: 'enable low: both halves switched off (needs the enable pin)',
    },
    regulator: null,
    bridgeDropVolts: null,
    channels: 1,
    channelRoles: [
      { key: 'fwd', label: 'PWM forward', need: 'pwm', optional: false },
      { key: 'rev', label: 'PWM reverse', need: 'pwm', optional: false },
      { key: 'en', label: 'Enable (both halves)', need: 'digital-out', optional: true },
    ],
    chipRoles: [],
  },
  'pwm-dir': {
    id: 'pwm-dir',
    name: 'PWM + direction',
    // A class of modules, not one chip: typical 10 A PWM + direction boards. Every figure here,
    // the logic levels and the brake behaviour are from memory.
    maxPwmHz: 20_000,
    maxPwmSource: 'typical PWM + direction module, up to 20 kHz; check your module',
    ratings: {
      continuousA: 10,
      peakA: 30,
      motorVolts: { min: 6, max: 30 },
      source: 'typical 10 A PWM + direction module; enter your module’s ratings',
    },
    logic: { minHigh: { volts: 3 }, supplyVolts: null, note: 'typical modules accept 3.3 V and 5 V logic' },
    stopModes: { brake: 'PWM low: most modules short the motor through the low side', coast: null },
    regulator: null,
    bridgeDropVolts: null,
    channels: 2,
    channelRoles: [
      { key: 'pwm', label: 'PWM', need: 'pwm', optional: false },
      { key: 'dir', label: 'Direction', need: 'digital-out', optional: false },
    ],
    chipRoles: [],
  },
  'en-in1-in2': {
    id: 'en-in1-in2',
    name: 'Enable + two inputs (L298 class)',
    // L298 datasheet: VS from VIH + 2.5 V to 46 V, VSS 4.5–7 V, VIH ≥ 2.3 V, 2 A DC per channel,
    // 3 A non-repetitive peak, commutation frequency 25 kHz typical, total drop 1.8–3.2 V at 1 A.
    // Modules carry a 78M05 regulator that may feed the logic from up to 12 V (common module note, from memory).
    // Brake and coast truth table from memory (REFERENCES §7).
    maxPwmHz: 25_000,
    maxPwmSource: 'L298 datasheet, commutation frequency 25 kHz typical',
    ratings: {
      continuousA: 2,
      peakA: 3,
      motorVolts: { min: 4.8, max: 46 },
      source: 'L298 datasheet: 2 A DC per channel, 3 A non-repetitive peak, VS up to 46 V',
    },
    logic: {
      minHigh: { volts: 2.3 },
      supplyVolts: { min: 4.5, max: 7 },
      note: 'TTL inputs, high from 2.3 V (L298 datasheet)',
    },
    stopModes: { brake: 'enable high, both inputs equal', coast: 'enable low' },
    regulator: {
      outputVolts: 5,
      maxInputVolts: 12,
      note: 'the module’s 5 V regulator, used with its jumper fitted, for motor supplies up to 12 V',
    },
    bridgeDropVolts: 2.5,
    channels: 2,
    channelRoles: [
      { key: 'en', label: 'Enable (PWM)', need: 'pwm', optional: false },
      { key: 'in1', label: 'Input 1', need: 'digital-out', optional: false },
      { key: 'in2', label: 'Input 2', need: 'digital-out', optional: false },
    ],
    chipRoles: [],
  },
  'pwm-in1-in2-stby': {
    id: 'pwm-in1-in2-stby',
    name: 'PWM + two inputs + standby (TB6612 class)',
    // TB6612FNG datasheet: VM 2.5–13.5 V (15 V absolute), VCC 2.7–5.5 V, 1.2 A average and
    // 3.2 A peak per channel, PWM up to 100 kHz, STBY low = standby with internal pull-down.
    // Inputs read high from 0.7 × VCC (from memory): power VCC from the board's own logic supply.
    // Brake with both inputs high, coast with both low: from memory (REFERENCES §7).
    maxPwmHz: 100_000,
    maxPwmSource: 'TB6612FNG datasheet, PWM input up to 100 kHz',
    ratings: {
      continuousA: 1.2,
      peakA: 3.2,
      motorVolts: { min: 2.5, max: 13.5 },
      source: 'TB6612FNG datasheet: 1.2 A average, 3.2 A peak, VM 2.5–13.5 V',
    },
    logic: {
      minHigh: { fractionOfVcc: 0.7 },
      supplyVolts: { min: 2.7, max: 5.5 },
      note: 'inputs read high from 0.7 × VCC: feed VCC from the board’s logic supply',
    },
    stopModes: { brake: 'both inputs high: short brake', coast: 'both inputs low: outputs off' },
    regulator: null,
    bridgeDropVolts: null,
    channels: 2,
    channelRoles: [
      { key: 'pwm', label: 'PWM', need: 'pwm', optional: false },
      { key: 'in1', label: 'Input 1', need: 'digital-out', optional: false },
      { key: 'in2', label: 'Input 2', need: 'digital-out', optional: false },
    ],
    chipRoles: [{ id: 'stby', label: 'Standby', need: 'digital-out', optional: false, shareable: true }],
  },
  'two-input': {
    id: 'two-input',
    name: 'Two-input bridge, both PWM (DRV8833 class)',
    // DRV8833 datasheet: VM 2.7–10.8 V, 1.5 A RMS and 2 A peak per bridge (HTSSOP/QFN).
    // Input threshold, top PWM frequency and the brake/coast truth table from memory (REFERENCES §7).
    maxPwmHz: 50_000,
    maxPwmSource: 'DRV8833-class bridge, typically up to 50 kHz',
    ratings: {
      continuousA: 1.5,
      peakA: 2,
      motorVolts: { min: 2.7, max: 10.8 },
      source: 'DRV8833 datasheet: 1.5 A RMS, 2 A peak per bridge, VM 2.7–10.8 V',
    },
    logic: { minHigh: { volts: 2 }, supplyVolts: null, note: 'inputs read high from about 2 V and take 3.3 V or 5 V' },
    stopModes: { brake: 'both inputs high', coast: 'both inputs low' },
    regulator: null,
    bridgeDropVolts: null,
    channels: 2,
    channelRoles: [
      { key: 'in1', label: 'Input 1 (PWM)', need: 'pwm', optional: false },
      { key: 'in2', label: 'Input 2 (PWM)', need: 'pwm', optional: false },
    ],
    chipRoles: [],
  },
  'servo-esc': {
    id: 'servo-esc',
    name: 'Servo-pulse ESC',
    // A brushed ESC reads servo pulses (1000–2000 µs, 50 Hz); its ratings are the ESC's own.
    // That most ESC inputs read 3.3 V pulses is from memory.
    maxPwmHz: null,
    maxPwmSource: 'servo pulses at 50 Hz; the ESC makes its own PWM',
    ratings: { continuousA: null, peakA: null, motorVolts: null, source: 'the ESC’s own label' },
    logic: { minHigh: { volts: 2.5 }, supplyVolts: null, note: 'most ESC signal inputs read 3.3 V pulses' },
    stopModes: {
      brake: 'centre pulse; the ESC’s own brake setting decides',
      coast: 'centre pulse; the ESC’s own brake setting decides',
    },
    regulator: {
      outputVolts: 5,
      maxInputVolts: 12,
      note: 'an ESC with a BEC can feed the board 5 V (check the ESC’s label)',
    },
    bridgeDropVolts: null,
    channels: 1,
    channelRoles: [{ key: 'signal', label: 'Signal (servo pulse)', need: 'servo-pulse', optional: false }],
    chipRoles: [],
  },
};

/** The pin roles of one driver with `motorCount` motors on it, in a stable order. */
export function driverPinRoles(kind: DriverKindId, motorCount: number): DriverPinRole[] {
  const spec = DRIVER_KINDS[kind];
  const perChannel = CHANNEL_PREFIXES.slice(0, Math.min(motorCount, spec.channels)).flatMap((prefix) =>
    spec.channelRoles.map((role) => ({
      id: `${prefix}.${role.key}`,
      label: `${prefix.toUpperCase()} ${role.label}`,
      need: role.need,
      optional: role.optional,
      shareable: false,
    })),
  );
  return [...perChannel, ...spec.chipRoles];
}
