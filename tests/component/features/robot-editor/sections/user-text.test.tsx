import { cleanup } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SafetySection } from '@/features/robot-editor/sections/safety-section';
import { assignPins } from '@shared/pins/assign-pins';
import type { BoardId, DriverKindId } from '@shared/schemas/ids';
import { DRIVER_KIND_IDS } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';
import { renderWiring } from '../../wiring/render-wiring';
import { renderSection } from './section-harness';

// Source markers belong in code comments; the builder reads the figures.
const PROVENANCE = /from memory|common practice|\((quoted|seen|derived)\)/i;

/**
 * A robot with pins placed whose numbers set off the power advice: motors stalling above every
 * driver's peak and rated far below the pack, the board fed straight from a 6-cell pack. So the
 * sections show driver ratings, logic-level notes, stop modes, PWM advice and supply notes.
 */
function busyRobot(board: BoardId, driver: DriverKindId): RobotConfig {
  const starter = buildStarterConfig({ layout: 'differential', board, input: 'nrf24', driver });
  const placed = assignPins(starter);
  const config = placed.ok ? placed.config : starter;
  return {
    ...config,
    motors: config.motors.map((m) => ({ ...m, stallCurrentA: 60, ratedVoltage: 3 })),
    power: { ...config.power, cells: 6, logicSupply: 'board-vin' },
  };
}

const cases = DRIVER_KIND_IDS.flatMap((driver) =>
  (['nano', 'esp32-devkitc'] as const).map((board) => [driver, board] as const),
);

describe('text in the Wiring and Safety sections', () => {
  it.each(cases)('has no source markers with %s drivers on the %s', (driver, board) => {
    const config = busyRobot(board, driver);
    const wiring = renderWiring(config);
    expect(wiring.container.textContent).toMatch(/Driver 1/);
    expect(wiring.container.textContent).not.toMatch(PROVENANCE);
    cleanup();
    const safety = renderSection(SafetySection, config);
    expect(safety.container.textContent).toMatch(/above the .* peak|depends on the module/);
    expect(safety.container.textContent).not.toMatch(PROVENANCE);
  });
});
