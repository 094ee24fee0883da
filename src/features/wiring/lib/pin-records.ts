import type { PinDemand } from '@shared/pins/pin-demands';
import type { PinAssignment, RobotConfig } from '@shared/schemas/robot-config';

/** The parts of a demand that say where its pin is kept in the configuration. */
export type DemandPlace = Pick<PinDemand, 'owner' | 'driverIndex' | 'roleId'>;

/** The stored assignment of a role (unassigned when the record has no entry yet). */
export function assignmentOf(config: RobotConfig, place: DemandPlace): PinAssignment {
  const empty = { pin: null, locked: false };
  switch (place.owner) {
    case 'driver':
      return config.wiring.drivers[place.driverIndex!]?.pins[place.roleId] ?? empty;
    case 'input':
      return config.wiring.inputPins[place.roleId] ?? empty;
    case 'status-led':
      return config.wiring.statusLed;
    case 'bench-test':
      return config.wiring.benchTestPin;
    case 'remote':
      return config.controls.link.remotePins[place.roleId] ?? empty;
  }
}

/** A copy of the configuration with one role's assignment replaced; every other record is shared. */
export function withAssignment(config: RobotConfig, place: DemandPlace, value: PinAssignment): RobotConfig {
  const wiring = config.wiring;
  switch (place.owner) {
    case 'driver':
      return {
        ...config,
        wiring: {
          ...wiring,
          drivers: wiring.drivers.map((d, i) =>
            i === place.driverIndex ? { ...d, pins: { ...d.pins, [place.roleId]: value } } : d,
          ),
        },
      };
    case 'input':
      return { ...config, wiring: { ...wiring, inputPins: { ...wiring.inputPins, [place.roleId]: value } } };
    case 'status-led':
      return { ...config, wiring: { ...wiring, statusLed: value } };
    case 'bench-test':
      return { ...config, wiring: { ...wiring, benchTestPin: value } };
    case 'remote': {
      const link = config.controls.link;
      return {
        ...config,
        controls: { ...config.controls, link: { ...link, remotePins: { ...link.remotePins, [place.roleId]: value } } },
      };
    }
  }
}

/** Chooses a pin for a role (null clears it); the lock stays as it was. */
export function setRolePin(config: RobotConfig, place: DemandPlace, pin: string | null): RobotConfig {
  return withAssignment(config, place, { ...assignmentOf(config, place), pin });
}

/** Locks or unlocks a role's pin: a locked pin is kept by "Assign free pins". */
export function setRoleLock(config: RobotConfig, place: DemandPlace, locked: boolean): RobotConfig {
  return withAssignment(config, place, { ...assignmentOf(config, place), locked });
}
