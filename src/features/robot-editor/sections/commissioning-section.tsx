import { useDeferredValue } from 'react';
import { Panel } from '@/components/ui/panel';
import { BenchCheck } from '../components/commissioning/bench-check';
import { CommissioningDiagram } from '../components/commissioning-diagram';
import type { SectionProps } from '@/lib/editor-sections';

/** Commissioning: the wheels-up bench check, and what every wheel should do for each stick. */
export function CommissioningSection({
  config,
  onChange,
  canEdit,
  validConfig,
  fieldErrors,
  requestSave,
}: SectionProps) {
  const checked = useDeferredValue(validConfig ?? config);
  // The fix replaces the draft, so it waits until every field of the draft is valid.
  const draftValid = Object.keys(fieldErrors ?? {}).length === 0;
  const bench = checked.firmware;
  return (
    <div className="flex flex-col gap-4">
      <Panel
        title="Wheels-up check"
        titleId="bench-check-title"
        description={`Lift the robot so no wheel touches anything. Start the firmware's bench test (type “bench” in the serial monitor${checked.wiring.benchTestPin.pin ? `, or hold ${checked.wiring.benchTestPin.pin} low at power-on` : ''}): each motor runs forward at ${Math.round(bench.benchTestDuty * 100)} % for ${(bench.benchTestMs / 1000).toFixed(1)} s, one after another. Say what you saw.`}
      >
        {canEdit && !draftValid && (
          <p className="mb-2 text-sm font-semibold text-warn-strong">
            Fix the fields listed under “All problems” first: the check’s fix replaces the draft.
          </p>
        )}
        <BenchCheck config={checked} canEdit={canEdit && draftValid} onApply={onChange} onSave={requestSave} />
      </Panel>
      <Panel
        title="Expected wheel directions"
        titleId="expected-directions-title"
        description="What every wheel should do for each stick on its own, wheels off the ground."
      >
        <CommissioningDiagram config={checked} />
      </Panel>
    </div>
  );
}
