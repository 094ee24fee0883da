import { useDeferredValue } from 'react';
import { Cautions } from '@/components/ui/cautions';
import { DraftFields } from '../components/fields/draft-fields-context';
import { PowerAdvicePanel } from '../components/safety/power-advice-panel';
import { MotorSafetyForm, PowerForm } from '../components/safety/safety-forms';
import type { SectionProps } from '@/lib/editor-sections';

/** Safety: motor limits, battery and supply, the power advice, and the cautions always in view. */
export function SafetySection({ config, onChange, canEdit, validConfig, fieldErrors }: SectionProps) {
  const engineConfig = useDeferredValue(validConfig ?? config);
  return (
    <DraftFields config={config} onChange={onChange} errors={fieldErrors} disabled={!canEdit}>
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex min-w-0 flex-col gap-4">
          <MotorSafetyForm />
          <PowerForm />
          <PowerAdvicePanel config={engineConfig} />
        </div>
        <Cautions className="xl:sticky xl:top-4" />
      </div>
    </DraftFields>
  );
}
