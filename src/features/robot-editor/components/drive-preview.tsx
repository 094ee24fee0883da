import { useCallback, useEffect, useId, useMemo, useRef, useState } from 'react';
import { driveStep, type DriveStep, type DriveStepInput } from '@shared/kinematics/drive-step';
import { computeMixing, type Sticks } from '@shared/kinematics/mixing';
import { useHeldKeys } from '../hooks/use-held-keys';
import { combineSticks, firstPad, gamepadSticks } from '../lib/gamepad';
import { integratePose, START_POSE, type Pose } from '../lib/pose';
import { ARENA_KEYS, LEFT_STICK_KEYS, RIGHT_STICK_KEYS, KEY_HELP } from '../lib/preview-keys';
import { DriveReadout } from './drive-readout';
import { MotorBars } from './motor-bars';
import { PreviewArena } from './preview-arena';
import { CENTRE, VirtualStick, type StickValue } from './virtual-stick';

export interface DrivePreviewProps {
  /** The robot (a RobotConfig will do): chassis, motors, controls and safety. */
  config: DriveStepInput;
  /** Start with the ramp limit on (as the firmware runs). */
  defaultRamp?: boolean;
  className?: string;
}

interface Frame {
  sticks: Sticks;
  step: DriveStep;
  pose: Pose;
}

const AT_REST: Sticks = { forward: 0, strafe: 0, yaw: 0 };
const ARENA_COMPONENTS = ['forward', 'strafe', 'yaw'] as const;
const MAX_TRAIL = 1500;

const percentWords = (v: number, plus: string, minus: string) => `${plus && v >= 0 ? plus : minus} ${Math.abs(Math.round(v * 100))} %`;

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
  const [arena, setArena] = useState<Sticks>(AT_REST);
  const [rampOn, setRampOn] = useState(defaultRamp);
  const [ratePosition, setRatePosition] = useState<number>(rateSwitch.positions - 1);
  const [padName, setPadName] = useState<string | null>(null);
  const [frame, setFrame] = useState<Frame>(() => ({ sticks: AT_REST, step: driveStep(config, AT_REST, { mixing }), pose: START_POSE }));

  const inputs = useRef({ right, left, arena });
  inputs.current = { right, left, arena };
  const pose = useRef<Pose>(START_POSE);
  const trail = useRef<{ xM: number; yM: number }[]>([{ xM: 0, yM: 0 }]);
  const ramped = useRef<number[]>(mixing.motors.map(() => 0));

  const reset = useCallback(() => {
    pose.current = START_POSE;
    trail.current = [{ xM: 0, yM: 0 }];
    ramped.current = mixing.motors.map(() => 0);
    setFrame((f) => ({ ...f, pose: START_POSE }));
  }, [mixing]);

  useEffect(() => {
    ramped.current = mixing.motors.map(() => 0);
    let handle = 0;
    let last = performance.now();
    let idle = false;
    const tick = (now: number) => {
      const dtS = Math.min(0.05, Math.max(0, (now - last) / 1000));
      last = now;
      const pad = firstPad(typeof navigator !== 'undefined' && navigator.getGamepads ? navigator.getGamepads() : null);
      setPadName((name) => (name === (pad?.id ?? null) ? name : (pad?.id ?? null)));
      const { right: r, left: l, arena: a } = inputs.current;
      const onScreen = combineSticks({ forward: r.y, strafe: r.x, yaw: l.x }, a);
      const sticks = combineSticks(onScreen, pad ? gamepadSticks(pad) : null);
      const step = driveStep(config, sticks, { mixing, ratePosition, ramp: rampOn ? { previous: ramped.current, dtS } : undefined });
      ramped.current = step.ramped;
      const still = step.ramped.every((c) => c === 0) && Object.values(sticks).every((v) => v === 0);
      if (!(still && idle)) {
        pose.current = integratePose(pose.current, step.motion.twist, dtS);
        const tail = trail.current[trail.current.length - 1];
        if (Math.hypot(pose.current.xM - tail.xM, pose.current.yM - tail.yM) > 0.005) {
          trail.current.push({ xM: pose.current.xM, yM: pose.current.yM });
          if (trail.current.length > MAX_TRAIL) trail.current.splice(0, trail.current.length - MAX_TRAIL);
        }
        setFrame({ sticks, step, pose: pose.current });
      }
      idle = still;
      handle = requestAnimationFrame(tick);
    };
    handle = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(handle);
  }, [config, mixing, rampOn, ratePosition]);

  const arenaKeys = useHeldKeys(ARENA_KEYS, ARENA_COMPONENTS, setArena);
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
          <PreviewArena wheels={config.chassis.wheels} pose={frame.pose} trail={trail.current} motorCommands={commands} description={`The robot ${step.motion.words}.`} />
        </div>
        <p id={helpId} className="text-xs text-ink-muted">
          {KEY_HELP.arena}
        </p>
        <div className="flex flex-wrap items-center gap-x-4 gap-y-2 text-sm">
          <label className="inline-flex items-center gap-1.5">
            <input type="checkbox" checked={rampOn} onChange={(e) => setRampOn(e.target.checked)} className="accent-[var(--color-accent)]" />
            Ramp limit ({config.safety.rampPerSecond} full scale/s)
          </label>
          {rateSwitch.channel !== null && (
            <label className="inline-flex items-center gap-1.5">
              Rate switch
              <select value={ratePosition} onChange={(e) => setRatePosition(Number(e.target.value))} className="rounded border border-rule-strong bg-paper-raised px-1.5 py-0.5">
                {rateSwitch.rates.map((rate, i) => (
                  <option key={i} value={i}>
                    {`${['low', rateSwitch.positions === 3 ? 'middle' : 'high', 'high'][i]} (${Math.round(rate * 100)} %)`}
                  </option>
                ))}
              </select>
            </label>
          )}
          <button type="button" onClick={reset} className="rounded border border-accent px-2.5 py-0.5 text-accent-strong hover:bg-accent-soft">
            Reset position
          </button>
        </div>
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
            valueText={(v) => (v.x === 0 ? 'centred' : `turn ${v.x > 0 ? 'right' : 'left'} ${Math.abs(Math.round(v.x * 100))} %`)}
          />
          <VirtualStick
            label="Right stick: forward and strafe"
            size={124}
            value={{ x: sticks.strafe, y: sticks.forward }}
            onChange={setRight}
            keyMap={RIGHT_STICK_KEYS}
            keyHelp={KEY_HELP.right}
            valueText={(v) => `${percentWords(v.y, 'forward', 'back')}, ${percentWords(v.x, 'strafe right', 'strafe left')}`}
          />
        </div>
        <p className="text-xs text-ink-muted" aria-live="polite">
          {padName ? `Gamepad: ${padName}. ${KEY_HELP.gamepad}` : `No gamepad found: plug one in and press a button. ${KEY_HELP.gamepad}`}
        </p>
        <MotorBars motors={mixing.motors} outputs={step.outputs} targets={step.targets} />
        <DriveReadout step={step} sticks={sticks} outputLimitPercent={config.safety.outputLimitPercent} />
      </div>
    </div>
  );
}
