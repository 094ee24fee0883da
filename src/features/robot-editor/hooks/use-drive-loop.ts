import { useCallback, useEffect, useRef, useState, type RefObject } from 'react';
import { driveStep, type DriveStep, type DriveStepInput } from '@shared/kinematics/drive-step';
import type { Mixing, Sticks } from '@shared/kinematics/mixing';
import { combineSticks, firstPad, gamepadSticks } from '../lib/gamepad';
import { integratePose, START_POSE, type Pose } from '../lib/pose';

export interface DriveFrame {
  /** The sticks that went in (on-screen, keyboard and pad combined). */
  sticks: Sticks;
  step: DriveStep;
  pose: Pose;
}

const AT_REST: Sticks = { forward: 0, strafe: 0, yaw: 0 };
const MAX_TRAIL = 1500;
/** Longest step integrated at once, so a stalled tab does not jump the robot (seconds). */
const MAX_DT_S = 0.05;

function readPad() {
  const pads = typeof navigator !== 'undefined' && navigator.getGamepads ? navigator.getGamepads() : null;
  return firstPad(pads);
}

/**
 * The preview's animation: every frame (requestAnimationFrame) it reads the sticks and the
 * first gamepad, runs the engine's control step over the frame's time, moves the robot by
 * the body motion that step gives, and records the path. Frames at rest are not re-rendered.
 */
export function useDriveLoop(
  config: DriveStepInput,
  mixing: Mixing,
  inputs: RefObject<Sticks>,
  options: { ramp: boolean; ratePosition: number },
) {
  const { ramp, ratePosition } = options;
  const [frame, setFrame] = useState<DriveFrame>(() => ({
    sticks: AT_REST,
    step: driveStep(config, AT_REST, { mixing, ratePosition }),
    pose: START_POSE,
  }));
  const [padName, setPadName] = useState<string | null>(null);
  const pose = useRef<Pose>(START_POSE);
  const trail = useRef<{ xM: number; yM: number }[]>([{ xM: 0, yM: 0 }]);
  const ramped = useRef<number[]>([]);

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
      const dtS = Math.min(MAX_DT_S, Math.max(0, (now - last) / 1000));
      last = now;
      const pad = readPad();
      setPadName(pad?.id ?? null);
      const sticks = combineSticks(inputs.current ?? AT_REST, pad ? gamepadSticks(pad) : null);
      const step = driveStep(config, sticks, {
        mixing,
        ratePosition,
        ramp: ramp ? { previous: ramped.current, dtS } : undefined,
      });
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
  }, [config, mixing, inputs, ramp, ratePosition]);

  return { frame, trail: trail.current, padName, reset };
}
