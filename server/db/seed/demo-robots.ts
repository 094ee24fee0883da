import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { assignPins } from '@shared/pins/assign-pins';
import type { InputSourceId } from '@shared/schemas/ids';
import {
  CURRENT_SCHEMA_VERSION,
  RobotConfigSchema,
  type RobotConfig,
  type RobotConfigInput,
} from '@shared/schemas/robot-config';

// The first revision of each demo robot of the Larkspur Makers Club. Invented builds: the
// dimensions are plausible for small school robots, not measurements of anything real.
// Pins come from automatic assignment, as a builder pressing the wiring screen's button would get.

type WheelInput = RobotConfigInput['chassis']['wheels'][number];

function wheel(
  name: string,
  motor: string,
  at: { x: number; y: number; drive: number; roller?: number },
  extra: Partial<WheelInput>,
): WheelInput {
  return {
    name,
    kind: 'omni',
    xMm: round(at.x),
    yMm: round(at.y),
    driveAngleDeg: at.drive,
    rollerAngleDeg: at.roller ?? 0,
    radiusMm: 30,
    motor,
    reversed: false,
    maxRpm: 200,
    ...extra,
  };
}

const round = (n: number) => Math.round(n * 10) / 10;

function channels(source: InputSourceId, names: string[]) {
  const { low, centre, high } = INPUT_SOURCES[source].defaultCalibration;
  return names.map((name, index) => ({ number: index + 1, name, low, centre, high }));
}

/**
 * Three omni wheels 120° apart, 120 mm from the centre; the front wheel drives sideways. Each
 * wheel drives clockwise round the centre, as the engine's trio-omni starter layout has it.
 */
function greenhouseCart(): RobotConfigInput {
  const d = 120;
  const at = (deg: number, drive: number) => ({
    x: d * Math.cos((deg * Math.PI) / 180),
    y: d * Math.sin((deg * Math.PI) / 180),
    drive,
  });
  const spec = { radiusMm: 29, maxRpm: 180 };
  return {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Greenhouse Cart',
    chassis: {
      layout: 'trio-omni',
      params: { loneWheel: 'front', element: 'omni-wheels', centreDistanceMm: d, wheelRadiusMm: 29, maxRpm: 180 },
      wheels: [
        wheel('Front', 'Motor F', at(0, -90), spec),
        wheel('Rear right', 'Motor RR', at(240, 150), spec),
        wheel('Rear left', 'Motor RL', at(120, 30), spec),
      ],
    },
    // Left as a club would have built it: 6 V gear motors on a six-cell NiMH pack and stalls above
    // the TB6612's continuous rating, so the demo shows what power warnings look like.
    motors: ['Motor F', 'Motor RR', 'Motor RL'].map((name) => ({
      name,
      startThreshold: 0.08,
      stallCurrentA: 1.6,
      ratedVoltage: 6,
    })),
    controls: {
      source: 'ppm',
      channels: channels('ppm', [
        'Right stick across',
        'Right stick up',
        'Left stick up',
        'Left stick across',
        'Arm switch',
        'Rate switch',
      ]),
      axes: { forward: { channel: 2 }, strafe: { channel: 1 }, yaw: { channel: 4 } },
      rateSwitch: { channel: 6, rates: [0.5, 1] },
      armingSwitch: { channel: 5, armedWhen: 'high' },
    },
    wiring: {
      board: 'nano',
      drivers: [
        { name: 'Front driver', kind: 'pwm-in1-in2-stby', motors: ['Motor F', 'Motor RR'] },
        { name: 'Rear driver', kind: 'pwm-in1-in2-stby', motors: ['Motor RL'] },
      ],
    },
    safety: { armingRequired: true, failsafeTimeoutMs: 250 },
    power: { chemistry: 'nimh', cells: 6, capacityMah: 2000, dischargeC: 5 },
  };
}

/** Four mecanum wheels on a 180 × 220 mm footprint; rollers form an X seen from above. */
function aisleScout(): RobotConfigInput {
  const l = 90;
  const w = 110;
  const spec = { kind: 'mecanum' as const, radiusMm: 40, maxRpm: 250 };
  return {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Aisle Scout',
    chassis: {
      layout: 'quad-mecanum',
      params: { rollers: 'x', wheelbaseMm: 2 * l, trackWidthMm: 2 * w, wheelRadiusMm: 40, maxRpm: 250 },
      wheels: [
        wheel('Front left', 'Motor FL', { x: l, y: w, drive: 0, roller: -45 }, spec),
        wheel('Front right', 'Motor FR', { x: l, y: -w, drive: 0, roller: 45 }, spec),
        wheel('Rear right', 'Motor RR', { x: -l, y: -w, drive: 0, roller: -45 }, spec),
        wheel('Rear left', 'Motor RL', { x: -l, y: w, drive: 0, roller: 45 }, spec),
      ],
    },
    motors: ['Motor FL', 'Motor FR', 'Motor RR', 'Motor RL'].map((name) => ({
      name,
      startThreshold: 0.1,
      stallCurrentA: 3.2,
      ratedVoltage: 12,
    })),
    controls: {
      source: 'sbus',
      channels: channels('sbus', [
        'Roll stick',
        'Pitch stick',
        'Throttle stick',
        'Yaw stick',
        'Arm switch',
        'Rate switch',
        'Aux 1',
        'Aux 2',
      ]),
      axes: { forward: { channel: 2 }, strafe: { channel: 1 }, yaw: { channel: 4, expo: 0.4 } },
      rateSwitch: { channel: 6, rates: [0.35, 0.65, 1] },
      armingSwitch: { channel: 5, armedWhen: 'high' },
    },
    wiring: {
      board: 'esp32-devkitc',
      drivers: [
        { name: 'Front driver', kind: 'pwm-dir', motors: ['Motor FL', 'Motor FR'], pwmFrequencyHz: 20000 },
        { name: 'Rear driver', kind: 'pwm-dir', motors: ['Motor RR', 'Motor RL'], pwmFrequencyHz: 20000 },
      ],
    },
    safety: { armingRequired: true, outputLimitPercent: 80 },
    power: { chemistry: 'lipo', cells: 3, capacityMah: 2200, dischargeC: 25 },
  };
}

/** Two tracks 260 mm apart, driven like a differential pair. */
function gardenHauler(): RobotConfigInput {
  const spec = { kind: 'track' as const, radiusMm: 35, maxRpm: 120 };
  return {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Garden Hauler',
    chassis: {
      layout: 'differential',
      params: { element: 'tracks', trackWidthMm: 260, wheelRadiusMm: 35, maxRpm: 120 },
      wheels: [
        wheel('Left track', 'Motor L', { x: 0, y: 130, drive: 0 }, spec),
        wheel('Right track', 'Motor R', { x: 0, y: -130, drive: 0 }, spec),
      ],
    },
    motors: ['Motor L', 'Motor R'].map((name) => ({ name, startThreshold: 0.15, stallCurrentA: 6, ratedVoltage: 12 })),
    controls: {
      source: 'rc-pwm',
      channels: channels('rc-pwm', ['Steering', 'Throttle', 'Arm switch']),
      axes: { forward: { channel: 2 }, strafe: { channel: null }, yaw: { channel: 1, expo: 0.35 } },
      armingSwitch: { channel: 3, armedWhen: 'high' },
    },
    wiring: {
      board: 'uno',
      drivers: [
        { name: 'Left bridge', kind: 'dual-pwm', motors: ['Motor L'] },
        { name: 'Right bridge', kind: 'dual-pwm', motors: ['Motor R'] },
      ],
    },
    safety: { rampPerSecond: 2, armingRequired: true },
    power: { chemistry: 'lifepo4', cells: 4, capacityMah: 6000, dischargeC: 10 },
  };
}

/** Four omni wheels at the corners of a 160 mm square, each driving across its corner (the X layout). */
function benchKiwi(): RobotConfigInput {
  const a = 80;
  const spec = { radiusMm: 24, maxRpm: 300 };
  return {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: 'Bench Kiwi',
    chassis: {
      layout: 'quad-omni-x',
      params: { centreDistanceMm: round(a * Math.SQRT2), wheelRadiusMm: 24, maxRpm: 300 },
      wheels: [
        wheel('Front left', 'Motor FL', { x: a, y: a, drive: -45 }, spec),
        wheel('Front right', 'Motor FR', { x: a, y: -a, drive: -135 }, spec),
        wheel('Rear right', 'Motor RR', { x: -a, y: -a, drive: 135 }, spec),
        wheel('Rear left', 'Motor RL', { x: -a, y: a, drive: 45 }, spec),
      ],
    },
    motors: ['Motor FL', 'Motor FR', 'Motor RR', 'Motor RL'].map((name) => ({
      name,
      startThreshold: 0.12,
      stallCurrentA: 1.2,
      ratedVoltage: 6,
    })),
    controls: {
      source: 'nrf24',
      channels: channels('nrf24', ['Right stick across', 'Right stick up', 'Left stick across', 'Arm button']),
      axes: { forward: { channel: 2 }, strafe: { channel: 1 }, yaw: { channel: 3 } },
      armingSwitch: { channel: 4, armedWhen: 'high' },
      link: { rfChannel: 92, address: '4C4B4B5701', remoteBoard: 'nano' },
    },
    wiring: {
      board: 'rp2040-pico',
      drivers: [
        { name: 'Left driver', kind: 'two-input', motors: ['Motor FL', 'Motor RL'] },
        { name: 'Right driver', kind: 'two-input', motors: ['Motor FR', 'Motor RR'] },
      ],
    },
    safety: { failsafeTimeoutMs: 200, armingRequired: true, outputLimitPercent: 70 },
    power: { chemistry: 'li-ion', cells: 2, capacityMah: 2600, dischargeC: 5, logicSupply: 'separate-regulator' },
  };
}

/** The demo robots' first revisions, parsed (every default filled in), with their pins assigned. */
export function demoRobotConfigs(): RobotConfig[] {
  return [greenhouseCart(), aisleScout(), gardenHauler(), benchKiwi()].map((input) => {
    const config = RobotConfigSchema.parse(input);
    const assigned = assignPins(config);
    if (!assigned.ok) throw new Error(`Demo robot ${config.name}: ${assigned.reason}`);
    return assigned.config;
  });
}
