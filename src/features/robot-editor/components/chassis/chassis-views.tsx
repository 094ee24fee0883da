import { useMemo, useState } from 'react';
import { Panel } from '@/components/ui/panel';
import { motionEnvelope } from '@shared/kinematics/envelope';
import { computeMixing } from '@shared/kinematics/mixing';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { EnvelopePlot } from '../envelope-plot';
import { MixingMatrixTable } from '../mixing-matrix-table';
import { WhatIfReversedPanel } from '../what-if-reversed-panel';

/** The engine's view of the chassis: mixing matrix, motion envelope and "what if reversed". */
export function ChassisAnalysis({
  config,
  highlightMotor,
  onHighlightMotor,
}: {
  config: RobotConfig;
  highlightMotor: string | null;
  onHighlightMotor: (motor: string | null) => void;
}) {
  const mixing = useMemo(() => computeMixing(config), [config]);
  const envelope = useMemo(() => motionEnvelope(config), [config]);
  const [reversed, setReversed] = useState<string | null>(null);
  return (
    <>
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)]">
        <Panel
          title="Mixing"
          titleId="mixing-title"
          description="Each motor’s command for a full stick, after scaling so no motor exceeds 100 %."
        >
          <MixingMatrixTable
            mixing={mixing}
            highlightMotor={highlightMotor}
            onHighlightMotor={onHighlightMotor}
            caption="Motor command per full stick"
          />
        </Panel>
        <Panel
          title="Motion envelope"
          titleId="envelope-title"
          description="Top speed in every direction without turning, from the wheels’ top speeds."
        >
          <div className="mx-auto max-w-sm">
            <EnvelopePlot envelope={envelope} size={320} />
          </div>
        </Panel>
      </div>
      <Panel
        title="What if a motor were reversed?"
        titleId="what-if-title"
        description="Pick a motor to see what each stick would do if it turned the other way."
      >
        <WhatIfReversedPanel config={config} motor={reversed} onMotorChange={setReversed} />
      </Panel>
    </>
  );
}
