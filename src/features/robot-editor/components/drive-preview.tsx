import { useId, useMemo, useRef, useState } from 'react';
import type { DriveStepInput } from '@shared/kinematics/drive-step';
import { computeMixing, type Sticks } from '@shared/kinematics/mixing';
import { useDriveLoop } from '../hooks/use-drive-loop';
import { useHeldKeys } from '../hooks/use-held-keys';
import { combineSticks } from '../lib/gamepad';
import { ARENA_KEYS, KEY_HELP, LEFT_STICK_KEYS, RIGHT_STICK_KEYS } from '../lib/preview-keys';
import { DriveReadout } from './drive-readout';
import { MotorBars } from './motor-bars';
import { PreviewArena } from './preview-arena';
import { PreviewControls } from './preview-controls';
import { CENTRE, VirtualStick, type StickValue } from './virtual-stick';

export interface DrivePreviewProps {
  /** The robot (a RobotConfig will do): chassis, motors, controls and safety. Keep it stable between renders. */
  config: DriveStepInput;
  /** Start with the ramp limit on, as the firmware runs. */
  defaultRamp?: boolean;
  className?: string;
}

const ARENA_COMPONENTS = ['forward', 'strafe', 'yaw'] as const;
const AT_REST: Sticks = { forward: 0, strafe: 0, yaw: 0 };

const share = (v: number, plus: string, minus: string) => `${v >= 0 ? plus : minus} ${Math.abs(Math.round(v * 100))} %`;

/**
 * The drive preview: two on-screen sticks (pointer or keyboard), the keyboard on the floor
 * view, or the first USB gamepad, drive an animated top view through the engine's own
 * control step (`driveStep`: shaping → mixing → desaturation → ramp → output limit → start
 * threshold), with each motor's command as a bar and the robot's path on the floor.
 */
export function DrivePreview({ config, defaultRamp = true, className }: DrivePreviewProps) {
  const helpId = useId();
  const mixing = useMemo(() => computeMixing(config), [config]);
  const rateSwitch = config.controls.rateSwitch;
  const [right, setRight] = useState<StickValue>(CENTRE);
  const [left, setLeft] = useState<StickValue>(CENTRE);
  const [keys, setKeys] = useState<Sticks>(AT_REST);
  const [rampOn, setRampOn] = useState(defaultRamp);
  // The preview starts with the rate switch high, so full stick shows the whole range.
  const [ratePosition, setRatePosition] = useState<number>(rateSwitch.rates.length - 1);
  const inputs = useRef<Sticks>(AT_REST);
  inputs.current = combineSticks({ forward: right.y, strafe: right.x, yaw: left.x }, keys);
  const { frame, trail, padName, reset } = useDriveLoop(config, mixing, inputs, { ramp: rampOn, ratePosition });
  const arenaKeys = useHeldKeys(ARENA_KEYS, ARENA_COMPONENTS, setKeys);
  const { step, sticks } = frame;
  const commands = Object.fromEntries(mixing.motors.map((m, i) => [m, step.outputs[i]]));
  return (
    <div className={`grid gap-5 font-sans text-ink lg:grid-cols-[minmax(0,1.25fr)_minmax(0,1fr)] ${className ?? ''}`}>
      <div className="space-y-2">
        <div
          role="application"
          tabIndex={0}
          aria-label="Floor view: drive with the keyboard"
          aria-describedby={helpId}
          className="overflow-hidden rounded border border-rule"
          onKeyDown={arenaKeys.onKeyDown}
          onKeyUp={arenaKeys.onKeyUp}
          onBlur={arenaKeys.onBlur}
        >
          <PreviewArena
            wheels={config.chassis.wheels}
            pose={frame.pose}
            trail={trail}
            motorCommands={commands}
            description={`The robot ${step.motion.words}.`}
          />
        </div>
        <p id={helpId} className="text-xs text-ink-muted">
          {KEY_HELP.arena}
        </p>
        <PreviewControls
          rampOn={rampOn}
          onRampChange={setRampOn}
          rampPerSecond={config.safety.rampPerSecond}
          rateSwitch={rateSwitch}
          ratePosition={ratePosition}
          onRatePositionChange={setRatePosition}
          onReset={reset}
        />
      </div>
      <div className="space-y-4">
        <div className="flex flex-wrap items-start justify-around gap-3">
          <VirtualStick
            label="Left stick: yaw"
            axes="x"
            size={124}
            value={{ x: sticks.yaw, y: 0 }}
            onChange={setLeft}
            keyMap={LEFT_STICK_KEYS}
            keyHelp={KEY_HELP.left}
            valueText={(v) => (v.x === 0 ? 'centred' : share(v.x, 'turn right', 'turn left'))}
          />
          <VirtualStick
            label="Right stick: forward and strafe"
            size={124}
            value={{ x: sticks.strafe, y: sticks.forward }}
            onChange={setRight}
            keyMap={RIGHT_STICK_KEYS}
            keyHelp={KEY_HELP.right}
            valueText={(v) => `${share(v.y, 'forward', 'back')}, ${share(v.x, 'strafe right', 'strafe left')}`}
          />
        </div>
        <p className="text-xs text-ink-muted" aria-live="polite">
          {padName
            ? `Gamepad: ${padName}. ${KEY_HELP.gamepad}`
            : `No gamepad found: plug one in and press a button. ${KEY_HELP.gamepad}`}
        </p>
        <MotorBars motors={mixing.motors} outputs={step.outputs} targets={step.targets} />
        <DriveReadout step={step} sticks={sticks} outputLimitPercent={config.safety.outputLimitPercent} />
      </div>
    </div>
  );
}
