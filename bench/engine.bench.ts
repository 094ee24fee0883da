// Mixing + desaturation time per sample, for each starter layout, over 1,000,000 random
// stick samples (drawn before timing, so only the engine is measured).
import { performance } from 'node:perf_hooks';
import { computeMixing, mixSticks, type DesaturationMode } from '@shared/kinematics/mixing';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import { buildStarterConfig } from '@shared/starter';

const SAMPLES = 1_000_000;

function randomSticks(count: number): Float64Array {
  const values = new Float64Array(count * 3);
  for (let i = 0; i < values.length; i += 1) values[i] = Math.random() * 2 - 1;
  return values;
}

function time(mixing: ReturnType<typeof computeMixing>, sticks: Float64Array, mode: DesaturationMode) {
  let checksum = 0;
  const start = performance.now();
  for (let i = 0; i < SAMPLES; i += 1) {
    const commands = mixSticks(
      mixing,
      { forward: sticks[3 * i], strafe: sticks[3 * i + 1], yaw: sticks[3 * i + 2] },
      mode,
    );
    checksum += commands[0];
  }
  const ms = performance.now() - start;
  return { ms, checksum };
}

export async function run(): Promise<void> {
  const sticks = randomSticks(SAMPLES);
  console.log(`mixing + desaturation, ${SAMPLES.toLocaleString('en')} random stick samples per layout`);
  for (const layout of DRIVE_LAYOUT_IDS) {
    const mixing = computeMixing(buildStarterConfig({ layout }));
    time(mixing, sticks.subarray(0, 30_000), 'scale'); // warm-up
    for (const mode of ['scale', 'clip'] as const) {
      const { ms, checksum } = time(mixing, sticks, mode);
      const ns = (ms * 1e6) / SAMPLES;
      console.log(
        `  ${layout.padEnd(13)} ${mode.padEnd(5)} ${mixing.motors.length} motors  ${ns.toFixed(1).padStart(6)} ns/sample  ${ms.toFixed(0).padStart(5)} ms total  (checksum ${checksum.toFixed(3)})`,
      );
    }
  }
}
