import { motionEnvelope } from '@shared/kinematics/envelope';
import { computeMixing } from '@shared/kinematics/mixing';
import { CliError, printJson, readConfigFile } from '../io';
import { parseCliArgs, tidyNumber } from './mix';

// `matrix <config.json>` → { motors, matrix: [[forward, strafe, yaw] per motor], rank, envelope }
export async function run(args: string[]): Promise<number> {
  const { positionals } = parseCliArgs(args, {});
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const config = await readConfigFile(positionals[0]);
  const mixing = computeMixing(config);
  const envelope = motionEnvelope(config);
  printJson({
    motors: mixing.motors,
    matrix: mixing.matrix.map((row) => row.map((v) => tidyNumber(v))),
    rank: mixing.rank,
    envelope: {
      topSpeedMps: tidyNumber(envelope.topSpeedMps),
      topYawRadps: tidyNumber(envelope.topYawRadps),
      samples: envelope.samples.map((s) => ({
        headingDeg: tidyNumber(s.headingDeg),
        speedMps: tidyNumber(s.speedMps),
        fullStickMps: tidyNumber(s.fullStickMps),
      })),
    },
  });
  return 0;
}
