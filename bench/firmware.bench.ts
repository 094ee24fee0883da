// Firmware bundle figures (no pass/fail): render + zip time per bundle; cycles per control step
// (shaping + mixing + desaturation + ramp) on a simulated 16 MHz ATmega328P (simavr) for each
// starter layout, goal under 2,000; flash and RAM of each layout's Uno build with RC one wire
// per channel, goal under 40 % of flash and 50 % of RAM.
import { performance } from 'node:perf_hooks';
import { join } from 'node:path';
import { assignPins } from '@shared/pins/assign-pins';
import { DRIVE_LAYOUT_IDS, type DriveLayoutId, type DriverKindId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';
import { renderBundle } from '@server/features/firmware/render-bundle';
import { compileAvrSketch } from '@server/features/firmware/toolchain/avr-compile';
import { zipBundle } from '@server/features/firmware/zip-bundle';
import { GPIOR0, unoRegisters } from '../tests/firmware/helpers/avr-registers';
import { sketchFolders, writeBundle } from '../tests/firmware/helpers/bundle-files';
import { seededRandom } from '../tests/factories/random';
import { buildForSimulator } from '../tests/firmware/helpers/sim-firmware';
import { Timeline } from '../tests/firmware/helpers/timeline';
import { unoWiredConfig } from '../tests/firmware/helpers/uno-configs';
import { cyclesPerMs, simulate } from '../tests/firmware/sim/simavr';

const pad = (text: string | number, width: number) => String(text).padStart(width);

/** The first driver kind the pin plan can place on an Uno with RC one wire per channel. */
function unoRcConfig(layout: DriveLayoutId): { config: RobotConfig; driver: DriverKindId } | null {
  for (const driver of ['pwm-in1-in2-stby', 'pwm-dir', 'en-in1-in2', 'two-input', 'dual-pwm', 'servo-esc'] as const) {
    const assigned = assignPins(buildStarterConfig({ layout, board: 'uno', input: 'rc-pwm', driver }));
    if (assigned.ok) return { config: assigned.config, driver };
  }
  return null;
}

async function renderAndZip(): Promise<void> {
  console.log('render + zip per bundle (Uno, RC one wire per channel), 50 runs after 5 warm-up runs');
  for (const layout of DRIVE_LAYOUT_IDS) {
    const placed = unoRcConfig(layout);
    if (!placed) continue;
    const times: number[] = [];
    for (let i = 0; i < 55; i++) {
      const start = performance.now();
      await zipBundle(renderBundle(placed.config, { revision: i }));
      if (i >= 5) times.push(performance.now() - start);
    }
    times.sort((a, b) => a - b);
    console.log(
      `  ${layout.padEnd(13)} median ${times[25].toFixed(2)} ms, max ${times[times.length - 1].toFixed(2)} ms`,
    );
  }
}

function stepCycles(marks: [number, number][]): number[] {
  const steps: number[] = [];
  for (let i = 0; i + 1 < marks.length; i++)
    if (marks[i][1] === 1 && marks[i + 1][1] === 2) steps.push(marks[i + 1][0] - marks[i][0]);
  return steps.sort((a, b) => a - b);
}

function summary(steps: number[]): string {
  const at = (q: number) => steps[Math.min(steps.length - 1, Math.floor(q * steps.length))];
  return `min ${pad(steps[0], 5)}  median ${pad(at(0.5), 5)}  p95 ${pad(at(0.95), 5)}  max ${pad(steps[steps.length - 1], 5)}`;
}

async function controlStepCycles(): Promise<void> {
  console.log('cycles per control step on a simulated 16 MHz ATmega328P (300 random stick positions, iBUS input)');
  console.log(
    '  first the step alone (interrupts held off while it runs), then as it runs (receiver and timer interrupts included)',
  );
  for (const layout of DRIVE_LAYOUT_IDS) {
    const config = unoWiredConfig(layout, 'ibus', 'pwm-in1-in2-stby', (c) => {
      c.controls.armingSwitch.channel = null;
      c.safety.armingRequired = false;
    });
    const random = seededRandom(7);
    const t = new Timeline('ibus').frames(50, 250, { 1: 1500, 2: 1500, 4: 1500, 5: 1000 });
    let ms = 250;
    for (let p = 0; p < 300; p++, ms += 21) {
      const stick = () => Math.round(1000 + random() * 1000);
      t.frames(ms, ms + 21, { 1: stick(), 2: stick(), 4: stick(), 5: random() < 0.5 ? 1000 : 2000 });
    }
    const runs: string[] = [];
    for (const marks of ['MW_SIM_MARKS_ATOMIC', 'MW_SIM_MARKS']) {
      const build = await buildForSimulator(config, 1, marks);
      const result = await simulate(build.elfPath, {
        mcu: 'atmega328p',
        limitCycles: ms * cyclesPerMs,
        registers: unoRegisters(),
        markAddress: GPIOR0,
        events: t.events,
      });
      runs.push(summary(stepCycles(result.marks)));
    }
    console.log(`  ${layout.padEnd(13)} ${config.motors.length} motors  alone: ${runs[0]}`);
    console.log(`  ${''.padEnd(13)}           as run: ${runs[1]}`);
  }
}

async function unoSizes(): Promise<void> {
  console.log('flash and RAM of the Uno build, RC one wire per channel (flash of 32,256 bytes, RAM of 2,048)');
  for (const layout of DRIVE_LAYOUT_IDS) {
    const placed = unoRcConfig(layout);
    if (!placed) {
      console.log(`  ${layout.padEnd(13)} the pin plan cannot place this layout on an Uno`);
      continue;
    }
    const files = renderBundle(placed.config, { revision: 1 });
    const root = await writeBundle(files, 'bench-');
    const result = await compileAvrSketch(join(root, sketchFolders(files)[0]), 'uno');
    if (!result.ok) {
      console.log(`  ${layout.padEnd(13)} did not compile: ${result.messages.split('\n')[0]}`);
      continue;
    }
    const flash = (100 * result.flashBytes) / result.flashMax;
    const ram = (100 * result.ramBytes) / result.ramMax;
    console.log(
      `  ${layout.padEnd(13)} ${placed.driver.padEnd(16)} flash ${pad(result.flashBytes, 6)} B (${flash.toFixed(1)} %)  RAM ${pad(result.ramBytes, 5)} B (${ram.toFixed(1)} %)`,
    );
  }
}

export async function run(): Promise<void> {
  await renderAndZip();
  await controlStepCycles();
  await unoSizes();
}
