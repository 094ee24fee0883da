import { join } from 'node:path';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { computeMixing, mixSticks } from '@shared/kinematics/mixing';
import { sticksFromChannels, type RawByChannel } from '@shared/shaping/shape-channels';
import { applyStartThreshold } from '@shared/shaping/start-threshold';
import { renderBundle, type BundleFile } from '@server/features/firmware/render-bundle';
import { compileAvrSketch } from '@server/features/firmware/toolchain/avr-compile';
import { sketchFolders, writeBundle } from './bundle-files';

export interface SimBuild {
  files: BundleFile[];
  elfPath: string;
  flashBytes: number;
  ramBytes: number;
}

/**
 * Renders a bundle and compiles its robot sketch for the Uno with simulator marks on GPIOR0
 * (`MW_SIM_MARKS_ATOMIC` also holds interrupts off inside the marked control step).
 */
export async function buildForSimulator(
  config: RobotConfig,
  revision: number,
  marks = 'MW_SIM_MARKS',
): Promise<SimBuild> {
  const files = renderBundle(config, { revision });
  const root = await writeBundle(files, 'sim-');
  const folder = sketchFolders(files)[0];
  const build = await compileAvrSketch(join(root, folder), 'uno', { defines: [marks], outDir: join(root, 'build') });
  if (!build.ok) throw new Error(build.messages);
  return { files, elfPath: build.elfPath!, flashBytes: build.flashBytes, ramBytes: build.ramBytes };
}

/**
 * The signed duty (−255..255) the TypeScript engine gives each motor for raw channel readings:
 * shaping, mixing and desaturation, then the start threshold within the output limit, on the Uno's
 * 8-bit analogWrite() scale.
 */
export function engineDuties(config: RobotConfig, raw: RawByChannel): { duties: number[]; armed: boolean } {
  const shaped = sticksFromChannels(config, raw);
  const commands = mixSticks(computeMixing(config), shaped.sticks, config.controls.desaturation);
  const limit = config.safety.outputLimitPercent / 100;
  const duties = commands.map((c, i) => {
    const out = applyStartThreshold(c, config.motors[i].startThreshold, limit);
    return Math.sign(out) * Math.round(Math.abs(out) * 255);
  });
  return { duties, armed: shaped.armed };
}

/**
 * The range of duties the engine gives when every pulse channel in `raw` may be off by up to
 * `errorUs` either way (3 points per channel: −e, 0, +e; the engine is smooth, so the extremes
 * over this small box sit on its grid to within a step). Pulse inputs are timed by software,
 * so the firmware may see a width a few µs from the one sent; it must then drive like the
 * engine does for some width within that error.
 */
export function engineDutyRange(
  config: RobotConfig,
  raw: RawByChannel,
  errorUs: number,
): { low: number[]; high: number[] } {
  const channels = Object.keys(raw).map(Number);
  let low: number[] | null = null;
  let high: number[] | null = null;
  const total = 3 ** channels.length;
  for (let k = 0; k < total; k += 1) {
    const moved: RawByChannel = { ...raw };
    channels.forEach((ch, i) => {
      const step = Math.floor(k / 3 ** i) % 3;
      moved[ch] = (raw[ch] ?? 0) + (step - 1) * errorUs;
    });
    const { duties } = engineDuties(config, moved);
    low = low ? low.map((v, i) => Math.min(v, duties[i])) : duties;
    high = high ? high.map((v, i) => Math.max(v, duties[i])) : duties;
  }
  return { low: low!, high: high! };
}
