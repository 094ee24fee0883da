import type { RobotConfig } from '../schemas/robot-config';
import { checkPinPlan } from '../pins/check-pins';
import { powerAdvice } from '../power/power-advice';
import { engineProblems } from './engine-problems';
import type { Problem } from './problem';

/**
 * Every problem of a configuration — the drive engine's, the pin plan's and the power
 * advice's — errors first. The screens, the server and the command line all use this one list.
 */
export function robotProblems(config: RobotConfig): Problem[] {
  const problems = [...engineProblems(config), ...checkPinPlan(config), ...powerAdvice(config).problems];
  return [...problems.filter((p) => p.severity === 'error'), ...problems.filter((p) => p.severity === 'warning')];
}
