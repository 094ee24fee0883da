import { INPUT_SOURCES } from '../inputs/input-sources';
import { computeMixing, type Mixing } from '../kinematics/mixing';
import { maxWheelRadps, wheelRow } from '../kinematics/wheel-equation';
import { STICK_AXES, type StickAxis } from '../schemas/ids';
import type { RobotConfig } from '../schemas/robot-config';
import type { Problem } from './problem';

type EngineInput = Pick<RobotConfig, 'chassis' | 'motors' | 'controls' | 'safety'>;

const problem = (
  severity: Problem['severity'],
  code: string,
  path: Problem['path'],
  message: string,
  hint: string,
): Problem => ({
  severity,
  code,
  pins: [],
  roles: [],
  message,
  hint,
  path,
});

/** What the drive engine finds wrong or risky in a configuration (pins are checked elsewhere). */
export function engineProblems(config: EngineInput): Problem[] {
  const mixing = computeMixing(config);
  return [
    ...motionProblems(config, mixing),
    ...sharedMotorProblems(config),
    ...wheelKindProblems(config),
    ...controlProblems(config, mixing),
  ];
}

function motionProblems(config: EngineInput, mixing: Mixing): Problem[] {
  if (!mixing.canDrive && !mixing.canStrafe && !mixing.canTurn) {
    return [
      problem(
        'error',
        'layout-cannot-move',
        ['chassis', 'wheels'],
        'No combination of motor commands moves this robot.',
        'Check the wheel positions, driving directions and which motor drives each wheel.',
      ),
    ];
  }
  const out: Problem[] = [];
  const strafeChannel = config.controls.axes.strafe.channel;
  if (!mixing.canStrafe && strafeChannel !== null) {
    out.push(
      problem(
        'warning',
        'layout-cannot-strafe',
        ['controls', 'axes', 'strafe', 'channel'],
        `This layout cannot move sideways, so the strafe input (channel ${strafeChannel}) is ignored by design.`,
        'Leave it as it is, or clear the strafe channel to free it for something else.',
      ),
    );
  }
  if (!mixing.canTurn) {
    out.push(
      problem(
        'warning',
        'layout-cannot-turn',
        ['chassis', 'wheels'],
        'This layout cannot turn on the spot, so the yaw input is ignored.',
        'For mecanum wheels, check the roller pattern: seen from above the top rollers should form an X, and an O pattern on a square base cannot turn.',
      ),
    );
  }
  if (!mixing.canDrive) {
    out.push(
      problem(
        'warning',
        'layout-cannot-drive',
        ['chassis', 'wheels'],
        'This layout cannot drive forward, so the forward input is ignored.',
        'Check the driving direction of each wheel.',
      ),
    );
  }
  return out;
}

/** Wheels on one motor must want the same command for every motion, or they fight. */
function sharedMotorProblems(config: EngineInput): Problem[] {
  const out: Problem[] = [];
  const wheels = config.chassis.wheels;
  const perCommand = wheels.map((w) => wheelRow(w).map((h) => h / maxWheelRadps(w)));
  wheels.forEach((wheel, index) => {
    const first = wheels.findIndex((w) => w.motor === wheel.motor);
    if (first === index) return;
    const a = perCommand[first];
    const b = perCommand[index];
    const size = Math.max(...a.map(Math.abs), ...b.map(Math.abs), 1e-12);
    if (a.every((v, k) => Math.abs(v - b[k]) <= size * 1e-6)) return;
    const dot = a.reduce((sum, v, k) => sum + v * b[k], 0);
    const opposite = a.every((v, k) => Math.abs(v + b[k]) <= size * 1e-6);
    const names = `"${wheels[first].name}" and "${wheel.name}"`;
    if (opposite || dot < 0) {
      out.push(
        problem(
          'error',
          'shared-motor-opposed',
          ['chassis', 'wheels', index, 'reversed'],
          `Wheels ${names} share motor "${wheel.motor}" but would turn against each other.`,
          'Check the reversed flag and driving direction of these wheels.',
        ),
      );
    } else {
      out.push(
        problem(
          'warning',
          'shared-motor-disagrees',
          ['chassis', 'wheels', index, 'motor'],
          `Wheels ${names} share motor "${wheel.motor}" but need different speeds for some motions, so they scrub.`,
          'Give them the same driving direction, radius and top speed, or a motor each.',
        ),
      );
    }
  });
  return out;
}

function wheelKindProblems(config: EngineInput): Problem[] {
  const out: Problem[] = [];
  const wheels = config.chassis.wheels;
  wheels.forEach((wheel, index) => {
    const gamma = Math.abs(wheel.rollerAngleDeg);
    const fits = wheel.kind === 'mecanum' ? gamma > 0 : gamma === 0;
    if (!fits) {
      out.push(
        problem(
          'warning',
          'roller-angle-unusual',
          ['chassis', 'wheels', index, 'rollerAngleDeg'],
          `Wheel "${wheel.name}" is a ${wheel.kind} wheel with rollers at ${wheel.rollerAngleDeg}°.`,
          wheel.kind === 'mecanum'
            ? 'Mecanum rollers sit at ±45°.'
            : 'Only mecanum wheels have angled rollers; use 0°.',
        ),
      );
    }
  });
  // Wheels and tracks without rollers cannot slide sideways: they must all be parallel.
  const plain = wheels.map((w, index) => ({ w, index })).filter(({ w }) => w.kind === 'fixed' || w.kind === 'track');
  const reference = plain[0];
  for (const { w, index } of plain.slice(1)) {
    const turn = Math.abs(Math.sin(((w.driveAngleDeg - reference.w.driveAngleDeg) * Math.PI) / 180));
    if (turn > 1e-6) {
      out.push(
        problem(
          'warning',
          'plain-wheels-not-parallel',
          ['chassis', 'wheels', index, 'driveAngleDeg'],
          `Wheel "${w.name}" has no rollers and is not parallel to "${reference.w.name}", so one of them must skid sideways.`,
          'Make plain wheels and tracks parallel, or use omni or mecanum wheels.',
        ),
      );
    }
  }
  return out;
}

const AXIS_NAMES: Record<StickAxis, string> = { forward: 'Forward', strafe: 'Strafe', yaw: 'Yaw' };

function controlProblems(config: EngineInput, mixing: Mixing): Problem[] {
  const { controls, safety } = config;
  const out: Problem[] = [];
  if (safety.armingRequired && controls.armingSwitch.channel === null) {
    out.push(
      problem(
        'error',
        'arming-without-channel',
        ['controls', 'armingSwitch', 'channel'],
        'Arming is required but no channel is set for the arming switch, so the motors could never run.',
        'Choose the arming switch channel, or turn off "arming required".',
      ),
    );
  }
  const can: Record<StickAxis, boolean> = { forward: mixing.canDrive, strafe: mixing.canStrafe, yaw: mixing.canTurn };
  for (const axis of STICK_AXES) {
    if (can[axis] && controls.axes[axis].channel === null) {
      out.push(
        problem(
          'warning',
          'axis-without-channel',
          ['controls', 'axes', axis, 'channel'],
          `${AXIS_NAMES[axis]} has no channel, so the robot will not ${axis === 'forward' ? 'drive forward' : axis === 'strafe' ? 'move sideways' : 'turn'} from the remote.`,
          'Choose the channel of the stick that should drive it.',
        ),
      );
    }
  }
  const uses: [string, Problem['path'], number | null][] = [
    ...STICK_AXES.map((axis): [string, Problem['path'], number | null] => [
      AXIS_NAMES[axis],
      ['controls', 'axes', axis, 'channel'],
      controls.axes[axis].channel,
    ]),
    ['The rate switch', ['controls', 'rateSwitch', 'channel'], controls.rateSwitch.channel],
    ['The arming switch', ['controls', 'armingSwitch', 'channel'], controls.armingSwitch.channel],
  ];
  uses.forEach(([label, path, channel], i) => {
    const earlier = uses.slice(0, i).find(([, , other]) => channel !== null && other === channel);
    if (earlier) {
      out.push(
        problem(
          'warning',
          'channel-used-twice',
          path,
          `${label} uses channel ${channel}, which ${earlier[0].toLowerCase()} already uses.`,
          'Give each role its own channel unless you mean one stick to do both.',
        ),
      );
    }
  });
  const source = INPUT_SOURCES[controls.source];
  controls.channels.forEach((channel, index) => {
    if (channel.number > source.maxChannels) {
      out.push(
        problem(
          'error',
          'channel-beyond-source',
          ['controls', 'channels', index, 'number'],
          `Channel ${channel.number} is beyond what a ${source.name} carries (${source.maxChannels} channels).`,
          `Use channels 1 to ${source.maxChannels}.`,
        ),
      );
    }
  });
  return out;
}
