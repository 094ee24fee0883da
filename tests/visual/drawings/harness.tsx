import { DRIVE_LAYOUT_IDS, type DriveLayoutId } from '@shared/schemas/ids';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import { buildStarterConfig } from '@shared/starter';
import { ChassisDrawing } from '@/features/robot-editor/components/chassis-drawing';

// A page for looking at the drawings with every starter layout: ?layout=<id>&part=<name>.
const params = new URLSearchParams(window.location.search);
const layouts = (params.get('layout') ? [params.get('layout')] : DRIVE_LAYOUT_IDS) as DriveLayoutId[];
const part = params.get('part') ?? 'chassis';

export function Harness() {
  return (
    <main className="drafting-grid min-h-screen p-6 text-ink">
      <div className={`grid gap-4 ${layouts.length === 1 ? "max-w-xl grid-cols-1" : "grid-cols-3"}`}>
        {layouts.map((layout) => {
          const config = buildStarterConfig({ layout });
          return (
            <section key={layout} className="rounded border border-rule bg-paper-raised p-3">
              <h2 className="mb-2 text-sm font-semibold">{LAYOUT_LABELS[layout]}</h2>
              {part === 'chassis' && <ChassisDrawing wheels={config.chassis.wheels} title={`${LAYOUT_LABELS[layout]}, top view`} />}
            </section>
          );
        })}
      </div>
    </main>
  );
}
