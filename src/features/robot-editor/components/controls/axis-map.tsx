import { Panel } from '@/components/ui/panel';
import { STICK_AXES, type StickAxis } from '@shared/schemas/ids';
import { AxisCurvePlot } from '../axis-curve-plot';
import { DraftCheckbox, DraftNumberField, DraftSelectField } from '../fields/draft-fields';
import { useDraftFields } from '../fields/draft-fields-context';
import { channelOptions } from './channel-options';

const AXIS_WORDS: Record<StickAxis, { title: string; plus: string }> = {
  forward: { title: 'Forward', plus: 'stick ahead drives forward' },
  strafe: { title: 'Strafe', plus: 'stick right moves right' },
  yaw: { title: 'Yaw', plus: 'stick right turns clockwise' },
};

/** Which channel drives forward, strafe and yaw, each with its shaping and curve. */
export function AxisMap() {
  const { config, errors } = useDraftFields();
  const options = channelOptions(config);
  return (
    <Panel
      title="Stick map"
      titleId="axis-map-title"
      description="Deadband is the share of half travel that still reads as centre; expo softens the middle; rate is the output at full stick; reverse is for a stick that reads backwards."
    >
      <div className="grid gap-4 lg:grid-cols-3">
        {STICK_AXES.map((axis) => {
          const settings = config.controls.axes[axis];
          const base = ['controls', 'axes', axis];
          const plottable = ['deadband', 'expo', 'rate'].every((k) => !errors[`controls.axes.${axis}.${k}`]);
          return (
            <section key={axis} aria-labelledby={`axis-${axis}`} className="rounded border border-rule p-3">
              <h3 id={`axis-${axis}`} className="font-semibold">
                {AXIS_WORDS[axis].title}{' '}
                <span className="text-sm font-normal text-ink-muted">({AXIS_WORDS[axis].plus})</span>
              </h3>
              <div className="mt-2 flex items-start gap-x-4">
                <DraftSelectField path={[...base, 'channel']} label="Channel" options={options} width="w-40" />
                <DraftCheckbox path={[...base, 'reverse']} label="Reverse" className="pt-8" />
              </div>
              <div className="grid grid-cols-[6.5rem_minmax(0,1fr)] gap-x-3">
                <div>
                  <DraftNumberField path={[...base, 'deadband']} label="Deadband" unit="%" scale={100} width="w-14" />
                  <DraftNumberField path={[...base, 'expo']} label="Expo" unit="%" scale={100} width="w-14" />
                  <DraftNumberField path={[...base, 'rate']} label="Rate" unit="%" scale={100} width="w-14" />
                </div>
                {plottable ? (
                  <AxisCurvePlot axis={settings} label={AXIS_WORDS[axis].title} size={168} className="max-w-56" />
                ) : (
                  <p className="pt-6 text-xs text-ink-muted">The curve returns when the values are valid.</p>
                )}
              </div>
            </section>
          );
        })}
      </div>
    </Panel>
  );
}
