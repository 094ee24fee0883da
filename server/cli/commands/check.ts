import { engineProblems } from '@shared/problems/engine-problems';
import { hasErrors, type Problem } from '@shared/problems/problem';
import { checkPinPlan } from '@shared/pins/check-pins';
import { powerAdvice } from '@shared/power/power-advice';
import { CliError, printJson, readConfigFile } from '../io';
import { parseCliArgs } from './mix';

/** Every problem of a configuration: the drive engine's, the pin plan's and the power advice's. */
export function allProblems(config: Parameters<typeof checkPinPlan>[0]): Problem[] {
  const problems = [...engineProblems(config), ...checkPinPlan(config), ...powerAdvice(config).problems];
  return [...problems.filter((p) => p.severity === 'error'), ...problems.filter((p) => p.severity === 'warning')];
}

// `check <config.json>` → { problems: [{ severity, code, pins, message, hint }] }; exit 1 on any error.
export async function run(args: string[]): Promise<number> {
  const { positionals } = parseCliArgs(args, {});
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const config = await readConfigFile(positionals[0]);
  const problems = allProblems(config);
  printJson({ problems: problems.map(({ severity, code, pins, message, hint }) => ({ severity, code, pins, message, hint })) });
  return hasErrors(problems) ? 1 : 0;
}
