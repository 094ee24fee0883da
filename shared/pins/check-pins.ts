import type { Problem } from '../problems/problem';
import type { RobotConfig } from '../schemas/robot-config';
import { checkDrivers } from './check-drivers';
import { checkPinRoles } from './check-pin-roles';
import { checkPwmHardware } from './check-pwm-hardware';
import { collectDemands } from './pin-demands';
import { planContexts } from './plan-context';

/**
 * Every problem of the pin plan: the robot board's pins, the handheld remote's pins (home-made
 * link), the PWM hardware behind them and the drivers. Errors first, then warnings, each group
 * in configuration order, so the list is stable for the same input.
 */
export function checkPinPlan(config: RobotConfig): Problem[] {
  const contexts = planContexts(config, collectDemands(config));
  const problems = [
    ...checkDrivers(config),
    ...contexts.flatMap((ctx) => [...checkPinRoles(ctx), ...checkPwmHardware(ctx)]),
  ];
  return [...problems.filter((p) => p.severity === 'error'), ...problems.filter((p) => p.severity === 'warning')];
}
