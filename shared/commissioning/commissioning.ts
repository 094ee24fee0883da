import type { RobotConfig, Wheel } from '../schemas/robot-config';

/**
 * The wheels-up check follows the firmware's bench test: each motor in turn, in the order of
 * `config.motors`, runs forward at the bench-test duty for the bench-test time while the
 * firmware prints `bench motor 1/4 "Front left" forward`. The builder says, for each motor,
 * which motor's wheels actually turned and whether they turned the expected way; Mixwright
 * then fixes the configuration instead of the wiring.
 */
export interface BenchStep {
  /** 0-based position in the bench test. */
  index: number;
  motor: string;
  /** The wheels this motor drives. */
  wheels: Wheel[];
  duty: number;
  ms: number;
  /** What the firmware prints when this motor starts. */
  consoleLine: string;
}

export function benchTestSteps(config: RobotConfig): BenchStep[] {
  const count = config.motors.length;
  return config.motors.map((motor, index) => ({
    index,
    motor: motor.name,
    wheels: config.chassis.wheels.filter((w) => w.motor === motor.name),
    duty: config.firmware.benchTestDuty,
    ms: config.firmware.benchTestMs,
    consoleLine: `bench motor ${index + 1}/${count} "${motor.name}" forward`,
  }));
}

/** What the builder saw while one motor of the bench test ran. */
export interface BenchFinding {
  /** The motor the firmware announced. */
  motor: string;
  /** Whose wheels turned: the same motor when on the expected corner, another when the wires are crossed, null when nothing turned. */
  turned: string | null;
  /** Whether those wheels turned the way the check expects for them. */
  direction: 'expected' | 'opposite';
}

/** Turns a motor round in the configuration: every wheel it drives has its reversed flag toggled. */
export function flipMotor(config: RobotConfig, motor: string): RobotConfig {
  return {
    ...config,
    chassis: {
      ...config.chassis,
      wheels: config.chassis.wheels.map((w) => (w.motor === motor ? { ...w, reversed: !w.reversed } : w)),
    },
  };
}

/** Renames driver channels at once: the channel that carried `from` now carries `mapping[from]`. */
export function relabelDriverMotors(config: RobotConfig, mapping: Readonly<Record<string, string>>): RobotConfig {
  return {
    ...config,
    wiring: {
      ...config.wiring,
      drivers: config.wiring.drivers.map((d) => ({ ...d, motors: d.motors.map((m) => mapping[m] ?? m) })),
    },
  };
}

/** Swaps two motors' places on the drivers (their channels), leaving their wheels and settings alone. */
export function swapMotors(config: RobotConfig, a: string, b: string): RobotConfig {
  return relabelDriverMotors(config, { [a]: b, [b]: a });
}

export type CommissioningResult =
  { ok: true; config: RobotConfig; actions: string[]; message: string | null } | { ok: false; reason: string };

/**
 * Applies a whole bench test's findings: first the channels are relabelled so each drives the
 * motor whose wheels it actually turned (a crossed pair is a swap), then every motor whose
 * wheels turned the wrong way is flipped. The findings must account for each motor once.
 */
export function applyFindings(config: RobotConfig, findings: readonly BenchFinding[]): CommissioningResult {
  const names = config.motors.map((m) => m.name);
  const silent = findings.filter((f) => f.turned === null).map((f) => f.motor);
  if (silent.length > 0) {
    return {
      ok: false,
      reason: `Nothing turned for ${quoteList(silent)}: check that motor's power, driver and pins before the configuration can help.`,
    };
  }
  const missing = names.filter((n) => !findings.some((f) => f.motor === n));
  if (missing.length > 0) return { ok: false, reason: `Answer the check for ${quoteList(missing)} first.` };
  const unknown = findings.filter((f) => !names.includes(f.turned as string)).map((f) => f.turned as string);
  if (unknown.length > 0) return { ok: false, reason: `No motor is named ${quoteList(unknown)}.` };
  const mapping = Object.fromEntries(findings.map((f) => [f.motor, f.turned as string]));
  const twice = names.filter((n) => findings.filter((f) => f.turned === n).length > 1);
  if (twice.length > 0) {
    return {
      ok: false,
      reason: `Two motors were said to turn the wheels of ${quoteList(twice)}; run the bench test again and watch each motor closely.`,
    };
  }
  const actions = cycleWords(mapping);
  let next = actions.length > 0 ? relabelDriverMotors(config, mapping) : config;
  for (const finding of findings) {
    if (finding.direction === 'opposite') {
      next = flipMotor(next, finding.turned as string);
      actions.push(`flipped ${finding.turned}`);
    }
  }
  return { ok: true, config: next, actions, message: actions.length ? commissioningMessage(actions) : null };
}

/** The revision message for a commissioning fix: "Commissioning: swapped A and B; flipped C". */
export function commissioningMessage(actions: readonly string[]): string {
  return `Commissioning: ${actions.join('; ')}`;
}

/** A relabelling in words: "swapped A and B" for a pair, "moved A to B, B to C, C to A" for a longer cycle. */
function cycleWords(mapping: Readonly<Record<string, string>>): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const start of Object.keys(mapping)) {
    if (seen.has(start) || mapping[start] === start) continue;
    const cycle: string[] = [];
    for (let at = start; !seen.has(at); at = mapping[at] ?? at) {
      seen.add(at);
      cycle.push(at);
    }
    if (cycle.length === 2) out.push(`swapped ${cycle[0]} and ${cycle[1]}`);
    else out.push(`moved channels ${cycle.map((m) => `${m} to ${mapping[m]}`).join(', ')}`);
  }
  return out;
}

function quoteList(names: string[]): string {
  return names.map((n) => `“${n}”`).join(', ');
}
