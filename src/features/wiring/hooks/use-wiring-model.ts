import { useMemo } from 'react';
import { getBoard } from '@shared/boards/boards';
import { driverPinRoles } from '@shared/drivers/driver-kinds';
import { collectDemands, type PinDemand } from '@shared/pins/pin-demands';
import { pwmAdvice } from '@shared/pins/pwm-advice';
import type { Problem } from '@shared/problems/problem';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { allPinChoices } from '../lib/pin-choices';
import { isWiringProblem } from '../lib/wiring-problems';

/** Everything the Wiring section derives from the draft, computed once per change. */
export function useWiringModel(config: RobotConfig, problems: Problem[]) {
  return useMemo(() => {
    const demands = collectDemands(config);
    const driverRoleLabels = config.wiring.drivers.map((d) =>
      Object.fromEntries(driverPinRoles(d.kind, d.motors.length).map((r) => [r.id, r.label])),
    );
    /** A role in the pin list's words: "Driver 1 · A PWM", "Channel 1 pulse". */
    const listLabel = (d: PinDemand) => {
      if (d.owner === 'driver')
        return `${config.wiring.drivers[d.driverIndex!].name} · ${driverRoleLabels[d.driverIndex!][d.roleId] ?? d.roleId}`;
      const text = d.owner === 'remote' ? d.label.replace(/^remote /, '') : d.label;
      return text.charAt(0).toUpperCase() + text.slice(1);
    };
    return {
      demands,
      robotDemands: demands.filter((d) => d.side === 'robot'),
      remoteDemands: demands.filter((d) => d.side === 'remote'),
      choices: allPinChoices(config, demands),
      advice: pwmAdvice(config),
      wiringProblems: problems.filter(isWiringProblem),
      board: getBoard(config.wiring.board),
      remoteBoard: getBoard(config.controls.link.remoteBoard),
      listLabel,
    };
  }, [config, problems]);
}
