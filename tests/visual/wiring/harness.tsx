import { useState } from 'react';
import { MemoryRouter } from 'react-router';
import { assignPins } from '@shared/pins/assign-pins';
import { robotProblems } from '@shared/problems/robot-problems';
import type { BoardId, DriveLayoutId, DriverKindId, InputSourceId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail, RobotDetail } from '@shared/schemas/robots';
import { buildStarterConfig } from '@shared/starter';
import { WiringSection } from '@/features/wiring/components/wiring-section';
import { WiringSheet } from '@/features/wiring/components/wiring-sheet';

// A page for looking at the Wiring section and the wiring sheet with a starter configuration per
// board: ?board=<id>[&assign=1][&clash=1][&part=sheet][&viewer=1].
const params = new URLSearchParams(window.location.search);

const STARTERS: Record<BoardId, { layout: DriveLayoutId; input: InputSourceId; driver: DriverKindId; name: string }> = {
  uno: { layout: 'differential', input: 'rc-pwm', driver: 'dual-pwm', name: 'Garden Hauler' },
  nano: { layout: 'trio-omni', input: 'ppm', driver: 'pwm-in1-in2-stby', name: 'Greenhouse Cart' },
  mega2560: { layout: 'quad-mecanum', input: 'sbus', driver: 'en-in1-in2', name: 'Shed Rover' },
  'esp32-devkitc': { layout: 'quad-mecanum', input: 'sbus', driver: 'pwm-dir', name: 'Aisle Scout' },
  'rp2040-pico': { layout: 'quad-omni-x', input: 'nrf24', driver: 'two-input', name: 'Bench Kiwi' },
};

function startConfig(): RobotConfig {
  const board = (params.get('board') ?? 'uno') as BoardId;
  const starter = STARTERS[board];
  let config = buildStarterConfig({ ...starter, board });
  if (params.get('assign') === '1') {
    const result = assignPins(config);
    if (result.ok) config = result.config;
  }
  if (params.get('clash') === '1') {
    const [first, second] = config.wiring.drivers[0].pins ? Object.keys(config.wiring.drivers[0].pins) : [];
    const pin = config.wiring.drivers[0].pins[first].pin;
    config = {
      ...config,
      wiring: {
        ...config.wiring,
        drivers: config.wiring.drivers.map((d, i) =>
          i === 0 ? { ...d, pins: { ...d.pins, [second]: { pin, locked: false } } } : d,
        ),
      },
    };
  }
  return config;
}

const initial = startConfig();
const head: RevisionDetail = {
  number: 4,
  message: 'Moved the receiver to its own pins',
  authorName: 'Maple Okafor',
  createdAt: '2026-03-14T16:20:00.000Z',
  config: initial,
};
const robot: RobotDetail['robot'] = {
  id: 'robot-1',
  teamId: 'team-1',
  name: initial.name,
  createdAt: head.createdAt,
  headRevision: 4,
  updatedAt: head.createdAt,
  lastFlash: null,
  photoUrl: null,
  teamName: 'Larkspur Makers Club',
  role: 'editor',
};

export function Harness() {
  const [config, setConfig] = useState(initial);
  if (params.get('part') === 'sheet') {
    return (
      <MemoryRouter>
        <WiringSheet robotName={robot.name} teamName={robot.teamName} revision={{ ...head, config }} />
      </MemoryRouter>
    );
  }
  return (
    <MemoryRouter>
      <main className="drafting-grid min-h-screen p-6 text-ink">
        <div className="mx-auto max-w-[1180px]">
          <WiringSection
            robot={robot}
            head={head}
            config={config}
            onChange={setConfig}
            problems={robotProblems(config)}
            canEdit={params.get('viewer') !== '1'}
          />
        </div>
      </main>
    </MemoryRouter>
  );
}
