import { DRIVE_LAYOUT_IDS, STICK_AXES, type DriveLayoutId } from '@shared/schemas/ids';
import { motionEnvelope } from '@shared/kinematics/envelope';
import { computeMixing } from '@shared/kinematics/mixing';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import { buildStarterConfig } from '@shared/starter';
import { AxisCurvePlot } from '@/features/robot-editor/components/axis-curve-plot';
import { ChassisDrawing } from '@/features/robot-editor/components/chassis-drawing';
import { CommissioningDiagram } from '@/features/robot-editor/components/commissioning-diagram';
import { DrivePreview } from '@/features/robot-editor/components/drive-preview';
import { EnvelopePlot } from '@/features/robot-editor/components/envelope-plot';
import { MixingMatrixTable } from '@/features/robot-editor/components/mixing-matrix-table';
import { WhatIfReversedPanel } from '@/features/robot-editor/components/what-if-reversed-panel';

// A page for looking at the drawings with the starter layouts: ?layout=<id>&part=<name>.
const params = new URLSearchParams(window.location.search);
const layouts = (params.get('layout') ? [params.get('layout')] : DRIVE_LAYOUT_IDS) as DriveLayoutId[];
const part = params.get('part') ?? 'chassis';
const reversed = params.get('reversed');

function configFor(layout: DriveLayoutId) {
  const config = buildStarterConfig({ layout });
  // names=long: motors named apart from their wheels, long enough to test the labels' room.
  if (params.get('names') === 'long') {
    const rename = (name: string) =>
      `M${config.motors.findIndex((m) => m.name === name) + 1} ${name.toLowerCase()} gearmotor`;
    config.chassis.wheels = config.chassis.wheels.map((w) => ({ ...w, motor: rename(w.motor) }));
    config.wiring.drivers = config.wiring.drivers.map((d) => ({ ...d, motors: d.motors.map(rename) }));
    config.motors = config.motors.map((m) => ({ ...m, name: rename(m.name) }));
  }
  if (reversed)
    config.chassis.wheels = config.chassis.wheels.map((w) => (w.motor === reversed ? { ...w, reversed: true } : w));
  if (params.get('expo'))
    STICK_AXES.forEach(
      (a) =>
        (config.controls.axes[a] = {
          ...config.controls.axes[a],
          expo: Number(params.get('expo')),
          deadband: 0.08,
          rate: 0.8,
        }),
    );
  return config;
}

function Part({ layout }: { layout: DriveLayoutId }) {
  const config = configFor(layout);
  switch (part) {
    case 'matrix':
      return <MixingMatrixTable mixing={computeMixing(config)} />;
    case 'envelope':
      return <EnvelopePlot envelope={motionEnvelope(config)} title={`${LAYOUT_LABELS[layout]} motion envelope`} />;
    case 'curves':
      return (
        <div className="grid grid-cols-3 gap-3">
          {STICK_AXES.map((a) => (
            <AxisCurvePlot key={a} axis={config.controls.axes[a]} label={a} input={0.5} />
          ))}
        </div>
      );
    case 'whatif':
      return <WhatIfReversedPanel config={config} defaultMotor={params.get('motor') ?? config.motors[0].name} />;
    case 'preview':
      return <DrivePreview config={config} />;
    case 'commissioning':
      return <CommissioningDiagram config={config} />;
    default:
      return (
        <ChassisDrawing
          wheels={config.chassis.wheels}
          title={`${LAYOUT_LABELS[layout]}, top view`}
          showGroundRollers={params.has('ground')}
        />
      );
  }
}

export function Harness() {
  const wide = ['whatif', 'preview', 'commissioning'].includes(part) || layouts.length === 1;
  return (
    <main className="drafting-grid min-h-screen p-6 text-ink">
      <div className={`grid gap-4 ${wide ? 'grid-cols-1' : 'grid-cols-3'}`}>
        {layouts.map((layout) => (
          <section
            key={layout}
            className={`rounded border border-rule bg-paper-raised p-3 ${layouts.length === 1 && part === 'chassis' ? 'max-w-xl' : ''}`}
          >
            <h2 className="mb-2 text-sm font-semibold">{LAYOUT_LABELS[layout]}</h2>
            <Part layout={layout} />
          </section>
        ))}
      </div>
    </main>
  );
}
