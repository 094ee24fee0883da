import { z } from 'zod';
import { BoardIdSchema, ChassisLayoutSchema, DriverKindIdSchema, InputSourceIdSchema, WheelKindSchema } from './ids';

/**
 * The whole robot, as saved in a revision, exported as config.json and read by the
 * command line. Bump CURRENT_SCHEMA_VERSION and add a migration step (in
 * shared/schemas/migrate-config.ts) whenever a saved file would no longer parse.
 *
 * Frames and signs (the same everywhere in Mixwright):
 * - Body frame: x forward, y to the left, z up; angles counter-clockwise seen from above,
 *   0° = forward. Positions in millimetres from the robot's centre.
 * - Stick commands are in the driver's view: forward +1 = ahead, strafe +1 = to the right,
 *   yaw +1 = turn right (clockwise seen from above). All in −1..1.
 */
export const CURRENT_SCHEMA_VERSION = 2;

const finite = (label: string) =>
  z.number({ error: `${label} must be a number` }).refine(Number.isFinite, `${label} must be a finite number`);

export const RobotNameSchema = z.string().trim().min(1, 'Give the robot a name').max(60, 'At most 60 characters');
/** Names of wheels, motors, channels and drivers: any text; firmware turns it into safe identifiers. */
export const PartNameSchema = z.string().trim().min(1, 'Give it a name').max(40, 'At most 40 characters');

export const WheelSchema = z.object({
  name: PartNameSchema,
  kind: WheelKindSchema,
  xMm: finite('x').pipe(z.number().min(-5000).max(5000)),
  yMm: finite('y').pipe(z.number().min(-5000).max(5000)),
  /** β: the direction the wheel pushes the robot when it turns forwards, from body +x, CCW. */
  driveAngleDeg: finite('Driving direction').pipe(z.number().min(-360).max(360)),
  /** γ: angle of the free rollers; 0 for omni and fixed wheels, ±45 for mecanum. */
  rollerAngleDeg: finite('Roller angle').pipe(
    z
      .number()
      .min(-60, 'Roller angle must be between −60° and 60°')
      .max(60, 'Roller angle must be between −60° and 60°'),
  ),
  radiusMm: finite('Radius').pipe(z.number().positive('Radius must be more than 0 mm').max(1000)),
  /** Name of the motor (in `motors`) that drives this wheel. */
  motor: PartNameSchema,
  /** The wheel turns backwards for a positive motor command (gearing, mounting or wiring). */
  reversed: z.boolean().default(false),
  maxRpm: finite('Max speed').pipe(z.number().positive('Max speed must be more than 0 rpm').max(100000)),
});
export type Wheel = z.infer<typeof WheelSchema>;

export const MotorSchema = z.object({
  name: PartNameSchema,
  /** Duty (0..0.6) below which this motor only hums; outputs jump past it. Found on the bench. */
  startThreshold: finite('Start threshold').pipe(z.number().min(0).max(0.6)).default(0),
  stallCurrentA: finite('Stall current').pipe(z.number().positive().max(500)).default(2),
  ratedVoltage: finite('Rated voltage').pipe(z.number().positive().max(100)).default(6),
});
export type Motor = z.infer<typeof MotorSchema>;

/**
 * A map from short keys (pin roles, parameter names) to values, with at most `maxEntries`
 * entries: every text in a configuration has a limit, keys included.
 */
function boundedRecord<Value extends z.ZodType>(value: Value, maxEntries = 32) {
  return z
    .record(z.string().max(40, 'Keys are at most 40 characters'), value)
    .refine((record) => Object.keys(record).length <= maxEntries, `At most ${maxEntries} entries`);
}

/** The preset parameters a starter layout was built from; the wheel table is what counts. */
export const LayoutParamsSchema = boundedRecord(
  z.union([z.number(), z.string().max(100, 'At most 100 characters'), z.boolean()]),
);

export const ChassisSchema = z.object({
  layout: ChassisLayoutSchema,
  params: LayoutParamsSchema.default({}),
  wheels: z.array(WheelSchema).min(1, 'A chassis needs at least one wheel').max(12, 'At most 12 wheels'),
});
export type Chassis = z.infer<typeof ChassisSchema>;

export const ChannelSchema = z
  .object({
    number: z.number().int().min(1).max(18),
    name: PartNameSchema,
    /** Calibration in the input source's own units (µs, SBUS counts, link counts). */
    low: finite('Low end'),
    centre: finite('Centre'),
    high: finite('High end'),
  })
  .refine((c) => c.low < c.centre && c.centre < c.high, {
    message: 'Low end, centre and high end must increase',
    path: ['centre'],
  });
export type Channel = z.infer<typeof ChannelSchema>;

export const AxisMapSchema = z.object({
  channel: z.number().int().min(1).max(18).nullable().default(null),
  reverse: z.boolean().default(false),
  /** Fraction of half travel (0..0.5) that reads as centre. */
  deadband: finite('Deadband').pipe(z.number().min(0).max(0.5)).default(0.04),
  /** 0 = linear, 1 = fully cubic. */
  expo: finite('Expo').pipe(z.number().min(0).max(1)).default(0.3),
  /** Output at full stick (0.05..1). */
  rate: finite('Rate').pipe(z.number().min(0.05).max(1)).default(1),
});
export type AxisMap = z.infer<typeof AxisMapSchema>;

/**
 * A two- or three-position switch that scales every axis. Since schema version 2 the number
 * of positions is the number of rates (version 1 stored both, and they could disagree).
 */
export const RateSwitchSchema = z.object({
  channel: z.number().int().min(1).max(18).nullable().default(null),
  /** Scale applied to every axis in each switch position, from low to high; one per position. */
  rates: z
    .array(finite('Rate').pipe(z.number().min(0.05).max(1)))
    .min(2, 'A rate switch has 2 or 3 positions: give 2 or 3 rates')
    .max(3, 'A rate switch has 2 or 3 positions: give 2 or 3 rates')
    .default([0.5, 1]),
});

export const ArmingSwitchSchema = z.object({
  channel: z.number().int().min(1).max(18).nullable().default(null),
  armedWhen: z.enum(['high', 'low']).default('high'),
});

const PinAssignmentSchema = z.object({
  /** Pin id from the board profile (its label on the board), or null when not yet chosen. */
  pin: z.string().min(1).max(16).nullable().default(null),
  /** Kept by automatic assignment. */
  locked: z.boolean().default(false),
});
export type PinAssignment = z.infer<typeof PinAssignmentSchema>;
export { PinAssignmentSchema };

/** Home-made 2.4 GHz link settings (used when the input source is `nrf24`). */
export const LinkSchema = z.object({
  rfChannel: z.number().int().min(0).max(125).default(76),
  dataRate: z.enum(['250k', '1M', '2M']).default('250k'),
  /** Five-byte pipe address, hex; unique per robot. */
  address: z
    .string()
    .max(10, 'Address must be 10 hexadecimal digits (5 bytes)')
    .regex(/^[0-9A-Fa-f]{10}$/, 'Address must be 10 hexadecimal digits (5 bytes)')
    .default('4D57520001'),
  sendRateHz: z.number().int().min(10).max(200).default(50),
  remoteBoard: BoardIdSchema.default('nano'),
  remotePins: boundedRecord(PinAssignmentSchema).default({}),
});

export const ControlsSchema = z.object({
  source: InputSourceIdSchema,
  channels: z.array(ChannelSchema).max(18),
  axes: z.object({
    forward: AxisMapSchema.prefault({}),
    strafe: AxisMapSchema.prefault({}),
    yaw: AxisMapSchema.prefault({}),
  }),
  rateSwitch: RateSwitchSchema.prefault({}),
  armingSwitch: ArmingSwitchSchema.prefault({}),
  /** How mixed commands above 100 % are brought back: scale keeps the direction of travel. */
  desaturation: z.enum(['scale', 'clip']).default('scale'),
  link: LinkSchema.prefault({}),
});
export type Controls = z.infer<typeof ControlsSchema>;

export const DriverSchema = z.object({
  name: PartNameSchema,
  kind: DriverKindIdSchema,
  /** Motors on this driver's channels, in channel order (A, then B). */
  motors: z.array(PartNameSchema).min(1).max(2),
  /** Pin role id (from the driver kind) → pin. */
  pins: boundedRecord(PinAssignmentSchema).default({}),
  /** null = the board's default PWM frequency. */
  pwmFrequencyHz: z.number().int().min(50).max(100000).nullable().default(null),
  stopMode: z.enum(['brake', 'coast']).default('brake'),
  /** The module's ratings as printed by its maker; defaults come from the driver kind. */
  continuousCurrentA: finite('Continuous current').pipe(z.number().positive().max(500)).nullable().default(null),
  peakCurrentA: finite('Peak current').pipe(z.number().positive().max(1000)).nullable().default(null),
});
export type Driver = z.infer<typeof DriverSchema>;

export const WiringSchema = z.object({
  board: BoardIdSchema,
  drivers: z.array(DriverSchema).max(8),
  /** Pin role id (from the input source) → pin. */
  inputPins: boundedRecord(PinAssignmentSchema).default({}),
  statusLed: PinAssignmentSchema.prefault({}),
  /** Optional: a pin held low at boot starts the bench test. */
  benchTestPin: PinAssignmentSchema.prefault({}),
});
export type Wiring = z.infer<typeof WiringSchema>;

export const SafetySchema = z.object({
  failsafeTimeoutMs: z.number().int().min(50).max(2000).default(250),
  /** Fastest change of a motor command, in full scale per second. */
  rampPerSecond: finite('Ramp limit').pipe(z.number().min(0.5).max(100)).default(4),
  outputLimitPercent: z.number().int().min(10).max(100).default(100),
  armingRequired: z.boolean().default(false),
  /** Brake or coast this long before a motor reverses. */
  reverseDwellMs: z.number().int().min(0).max(500).default(20),
  /** Valid frames needed after start-up or a failsafe before motors may run. */
  startupValidFrames: z.number().int().min(2).max(100).default(5),
  /** A stick within this fraction of centre counts as centred for start-up and re-arming. */
  centreTolerance: finite('Centre tolerance').pipe(z.number().min(0.01).max(0.3)).default(0.08),
});
export type Safety = z.infer<typeof SafetySchema>;

export const PowerSchema = z.object({
  chemistry: z.enum(['lipo', 'li-ion', 'lifepo4', 'nimh', 'lead-acid', 'alkaline']).default('lipo'),
  cells: z.number().int().min(1).max(24).default(2),
  capacityMah: z.number().int().min(100).max(100000).default(2200),
  dischargeC: finite('Discharge rating').pipe(z.number().positive().max(200)).default(20),
  logicSupply: z.enum(['usb', 'driver-regulator', 'separate-regulator', 'board-vin']).default('separate-regulator'),
});
export type Power = z.infer<typeof PowerSchema>;

export const FirmwareSchema = z.object({
  /** Arduino sketch folder name; null = derived from the robot name. */
  sketchName: z
    .string()
    .max(63, 'Letters, digits, _ . - only, starting with a letter or digit, up to 63')
    .regex(
      /^[A-Za-z0-9][A-Za-z0-9_.-]{0,62}$/,
      'Letters, digits, _ . - only, starting with a letter or digit, up to 63',
    )
    .nullable()
    .default(null),
  serialDiagnostics: z.boolean().default(true),
  serialBaud: z.union([z.literal(9600), z.literal(57600), z.literal(115200)]).default(115200),
  diagnosticsIntervalMs: z.number().int().min(250).max(60000).default(2000),
  benchTestDuty: finite('Bench test duty').pipe(z.number().min(0.05).max(0.6)).default(0.3),
  benchTestMs: z.number().int().min(200).max(5000).default(1000),
});
export type Firmware = z.infer<typeof FirmwareSchema>;

function duplicates(names: string[]): string[] {
  const seen = new Set<string>();
  return names.filter((n) => (seen.has(n) ? true : (seen.add(n), false)));
}

export const RobotConfigSchema = z
  .object({
    schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
    name: RobotNameSchema,
    chassis: ChassisSchema,
    motors: z.array(MotorSchema).min(1, 'A robot needs at least one motor').max(12),
    controls: ControlsSchema,
    wiring: WiringSchema,
    safety: SafetySchema.prefault({}),
    power: PowerSchema.prefault({}),
    firmware: FirmwareSchema.prefault({}),
  })
  .superRefine((config, ctx) => {
    const motorNames = config.motors.map((m) => m.name);
    for (const name of new Set(duplicates(motorNames))) {
      const index = motorNames.lastIndexOf(name);
      ctx.addIssue({ code: 'custom', path: ['motors', index, 'name'], message: `Two motors are named "${name}"` });
    }
    const wheelNames = config.chassis.wheels.map((w) => w.name);
    for (const name of new Set(duplicates(wheelNames))) {
      const index = wheelNames.lastIndexOf(name);
      ctx.addIssue({
        code: 'custom',
        path: ['chassis', 'wheels', index, 'name'],
        message: `Two wheels are named "${name}"`,
      });
    }
    config.chassis.wheels.forEach((wheel, index) => {
      if (!motorNames.includes(wheel.motor)) {
        ctx.addIssue({
          code: 'custom',
          path: ['chassis', 'wheels', index, 'motor'],
          message: `No motor is named "${wheel.motor}"`,
        });
      }
    });
    config.motors.forEach((motor, index) => {
      if (!config.chassis.wheels.some((w) => w.motor === motor.name)) {
        ctx.addIssue({
          code: 'custom',
          path: ['motors', index, 'name'],
          message: `Motor "${motor.name}" drives no wheel`,
        });
      }
    });
    const channelNumbers = config.controls.channels.map((c) => c.number);
    for (const number of new Set(duplicates(channelNumbers.map(String)))) {
      const index = channelNumbers.lastIndexOf(Number(number));
      ctx.addIssue({
        code: 'custom',
        path: ['controls', 'channels', index, 'number'],
        message: `Channel ${number} is listed twice`,
      });
    }
    const channelRefs: [string[], number | null][] = [
      [['axes', 'forward', 'channel'], config.controls.axes.forward.channel],
      [['axes', 'strafe', 'channel'], config.controls.axes.strafe.channel],
      [['axes', 'yaw', 'channel'], config.controls.axes.yaw.channel],
      [['rateSwitch', 'channel'], config.controls.rateSwitch.channel],
      [['armingSwitch', 'channel'], config.controls.armingSwitch.channel],
    ];
    for (const [path, channel] of channelRefs) {
      if (channel !== null && !channelNumbers.includes(channel)) {
        ctx.addIssue({
          code: 'custom',
          path: ['controls', ...path],
          message: `Channel ${channel} is not in the channel table`,
        });
      }
    }
    const driverNames = config.wiring.drivers.map((d) => d.name);
    for (const name of new Set(duplicates(driverNames))) {
      const index = driverNames.lastIndexOf(name);
      ctx.addIssue({
        code: 'custom',
        path: ['wiring', 'drivers', index, 'name'],
        message: `Two drivers are named "${name}"`,
      });
    }
  });

/** A configuration after parsing: every default filled in. */
export type RobotConfig = z.infer<typeof RobotConfigSchema>;
/** What a file or a form may hold before defaults are filled in. */
export type RobotConfigInput = z.input<typeof RobotConfigSchema>;
