import { useDeferredValue, useState } from 'react';
import { Panel } from '@/components/ui/panel';
import { ChassisDrawing } from '../components/chassis-drawing';
import { ChassisAnalysis } from '../components/chassis/chassis-views';
import { LayoutPanel } from '../components/chassis/layout-panel';
import { MotorTable } from '../components/chassis/motor-table';
import { WheelTable } from '../components/chassis/wheel-table';
import { DraftFields } from '../components/fields/draft-fields-context';
import type { SectionProps } from '@/lib/editor-sections';

/** Chassis: the drive layout, the wheel and motor tables, the drawing and the engine's analysis. */
export function ChassisSection({ config, onChange, canEdit, validConfig, fieldErrors }: SectionProps) {
  const engineConfig = useDeferredValue(validConfig ?? config);
  const [highlightMotor, setHighlightMotor] = useState<string | null>(null);
  return (
    <DraftFields config={config} onChange={onChange} errors={fieldErrors} disabled={!canEdit}>
      <div className="flex flex-col gap-4">
        <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_26rem]">
          <div className="flex flex-col gap-4">
            <LayoutPanel />
            <MotorTable />
          </div>
          <Panel
            title="Top view"
            titleId="top-view-title"
            description="To scale; forward is up. Arrows: where each wheel pushes for a positive command."
          >
            <ChassisDrawing wheels={engineConfig.chassis.wheels} highlightMotor={highlightMotor} />
          </Panel>
        </div>
        <WheelTable />
        <ChassisAnalysis config={engineConfig} highlightMotor={highlightMotor} onHighlightMotor={setHighlightMotor} />
      </div>
    </DraftFields>
  );
}
