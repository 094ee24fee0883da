import { assignPins } from '@shared/pins/assign-pins';
import { buildStarterConfig } from '@shared/starter';
import {
  DRIVE_LAYOUT_IDS,
  DRIVER_KIND_IDS,
  INPUT_SOURCE_IDS,
  type BoardId,
  type DriveLayoutId,
  type DriverKindId,
  type InputSourceId,
} from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';

export interface MatrixCase {
  name: string;
  layout: DriveLayoutId;
  input: InputSourceId;
  board: BoardId;
  driver: DriverKindId;
  /** The configuration after automatic pin assignment, or why the pin plan cannot place it. */
  config: RobotConfig | null;
  refusal: string | null;
}

/**
 * Every starter layout × every input source on each board, with the driver kinds rotated so
 * every kind appears, pins placed by the pin plan. Serial diagnostics stay on where the plan
 * allows it and are switched off where the receiver needs the USB serial pins; every other
 * case asks for a 16 kHz PWM frequency.
 */
export function matrixCases(boards: BoardId[]): MatrixCase[] {
  return DRIVE_LAYOUT_IDS.flatMap((layout, l) =>
    INPUT_SOURCE_IDS.flatMap((input, i) =>
      boards.map((board) => {
        const driver = DRIVER_KIND_IDS[(l + i) % DRIVER_KIND_IDS.length];
        const base = structuredClone(buildStarterConfig({ layout, board, input, driver }));
        // Every other case asks for a quiet 16 kHz PWM, so timer, LEDC and slice set-up compile too.
        if ((l + i) % 2 === 0) for (const d of base.wiring.drivers) d.pwmFrequencyHz = 16_000;
        let assigned = assignPins(base);
        if (!assigned.ok) {
          const quiet = structuredClone(base);
          quiet.firmware.serialDiagnostics = false;
          assigned = assignPins(quiet);
        }
        return {
          name: `${layout} / ${input} / ${board} / ${driver}`,
          layout,
          input,
          board,
          driver,
          config: assigned.ok ? assigned.config : null,
          refusal: assigned.ok ? null : assigned.reason,
        };
      }),
    ),
  );
}
