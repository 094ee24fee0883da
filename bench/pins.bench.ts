// Pin plan: time to check and to assign pins for a Mega 2560 with four dual half-bridge drivers
// (one PWM input per direction, eight PWM pins), the 2.4 GHz transceiver, and a rate switch and
// an arming switch on the remote. Goal: assignment under 50 ms.
import { assignPins } from '@shared/pins/assign-pins';
import { checkPinPlan } from '@shared/pins/check-pins';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';

function stats(samples: number[]): string {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  return `median ${at(0.5).toFixed(2)} ms, p95 ${at(0.95).toFixed(2)} ms, max ${sorted[sorted.length - 1].toFixed(2)} ms (${samples.length} runs)`;
}

function time(fn: () => void, runs: number): number[] {
  const samples: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    fn();
    samples.push(performance.now() - start);
  }
  return samples;
}

function benchCase(label: string, config: RobotConfig): void {
  const firstStart = performance.now();
  const result = assignPins(config);
  const first = performance.now() - firstStart;
  if (!result.ok) throw new Error(`No pin plan for the benchmark case: ${result.reason}`);
  const assigned = result.config;
  console.log(label);
  console.log(`  assign (first call): ${first.toFixed(2)} ms`);
  console.log(`  assign: ${stats(time(() => assignPins(config), 200))}`);
  console.log(`  check (no pins yet): ${stats(time(() => checkPinPlan(config), 500))}`);
  console.log(`  check (assigned plan): ${stats(time(() => checkPinPlan(assigned), 500))}`);
  console.log(`  problems after assignment: ${checkPinPlan(assigned).length}`);
}

export async function run(): Promise<void> {
  // The starter configuration carries the rate switch and the arming switch on the remote.
  const config = buildStarterConfig({ layout: 'quad-mecanum', board: 'mega2560', input: 'nrf24', driver: 'dual-pwm' });
  benchCase('Mega 2560, 4 dual half-bridges (8 PWM), transceiver, rate + arming switch, default PWM', config);
  const quiet = RobotConfigSchema.parse({
    ...config,
    wiring: { ...config.wiring, drivers: config.wiring.drivers.map((d) => ({ ...d, pwmFrequencyHz: 20000 })) },
  });
  benchCase('Same at 20 kHz (16-bit timers only)', quiet);
}
