import { describeMotion, type MotionFractions } from '@shared/kinematics/motion-words';
import { topRollerAngleDeg } from '@shared/kinematics/roller-pattern';
import type { WheelLike } from './chassis-geometry';
import { formatPercent } from './screen-frame';

const KIND_WORDS: Record<WheelLike['kind'], string> = {
  omni: 'omni wheel',
  mecanum: 'mecanum wheel',
  fixed: 'plain wheel',
  track: 'track',
  'omni-track': 'omni track',
};

const round = (v: number) => Math.round(v) + 0;

/** A direction in the body frame in words: "forward", "left", "30° left of forward"… */
export function directionWords(bodyDeg: number): string {
  const a = ((((round(bodyDeg) + 180) % 360) + 360) % 360) - 180;
  const named: Record<number, string> = {
    0: 'forward',
    90: 'left',
    [-90]: 'right',
    [-180]: 'backward',
    180: 'backward',
  };
  if (named[a] !== undefined) return named[a];
  if (Math.abs(a) < 90) return `${Math.abs(a)}° ${a > 0 ? 'left' : 'right'} of forward`;
  return `${180 - Math.abs(a)}° ${a > 0 ? 'left' : 'right'} of backward`;
}

/** One wheel in words, for screen readers and the drawing's description. */
export function describeWheel(wheel: WheelLike): string {
  const side = (mm: number, plus: string, minus: string) => `${Math.abs(round(mm))} mm ${mm >= 0 ? plus : minus}`;
  const push = directionWords(wheel.driveAngleDeg + (wheel.reversed ? 180 : 0));
  const rollers =
    (wheel.kind === 'mecanum' || wheel.kind === 'omni' || wheel.kind === 'omni-track') &&
    Math.abs(wheel.rollerAngleDeg) >= 1
      ? `, top rollers along ${Math.abs(round(topRollerAngleDeg(wheel)))}° ${topRollerAngleDeg(wheel) >= 0 ? 'left' : 'right'} of forward`
      : '';
  return (
    `${wheel.name} (motor ${wheel.motor}): ${KIND_WORDS[wheel.kind]}, ${round(wheel.radiusMm)} mm radius, ` +
    `${side(wheel.xMm, 'ahead of', 'behind')} and ${side(wheel.yMm, 'left of', 'right of')} the centre; ` +
    `a positive command pushes ${push}${wheel.reversed ? ' (reversed)' : ''}${rollers}.`
  );
}

/** The whole drawing in words. */
export function describeChassis(
  wheels: WheelLike[],
  options: { motorCommands?: Record<string, number>; motion?: MotionFractions | null } = {},
): string {
  const parts = [
    `Top view, forward is up, ${wheels.length} ${wheels.length === 1 ? 'wheel' : 'wheels'}.`,
    ...wheels.map(describeWheel),
  ];
  if (wheels.some((w) => w.kind === 'track' || w.kind === 'omni-track'))
    parts.push('Track lengths are not recorded and are drawn six radii long.');
  if (options.motorCommands) {
    const names = [...new Set(wheels.map((w) => w.motor))];
    parts.push(`Commands: ${names.map((n) => `${n} ${formatPercent(options.motorCommands?.[n] ?? 0)}`).join(', ')}.`);
  }
  if (options.motion) parts.push(`The robot ${describeMotion(options.motion)}.`);
  return parts.join(' ');
}
