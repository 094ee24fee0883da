import { lazy, Suspense, useDeferredValue } from 'react';
import { Panel } from '@/components/ui/panel';
import { LoadingState } from '@/components/ui/states';
import { AxisMap } from '../components/controls/axis-map';
import { ChannelTable } from '../components/controls/channel-table';
import { LinkPanel } from '../components/controls/link-panel';
import { SwitchesPanel } from '../components/controls/switches-panel';
import { DraftFields } from '../components/fields/draft-fields-context';
import type { SectionProps } from '@/lib/editor-sections';

// The preview runs an animation loop and the gamepad reader: loaded with the section, not before.
const DrivePreview = lazy(async () => ({ default: (await import('../components/drive-preview')).DrivePreview }));

/** Controls: the input source, channels, the stick map, switches, the link, and the drive preview. */
export function ControlsSection({ config, onChange, canEdit, validConfig, fieldErrors }: SectionProps) {
  const engineConfig = useDeferredValue(validConfig ?? config);
  return (
    <DraftFields config={config} onChange={onChange} errors={fieldErrors} disabled={!canEdit}>
      <div className="flex flex-col gap-4">
        <div className="grid items-start gap-4 2xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <ChannelTable />
          <SwitchesPanel />
        </div>
        <AxisMap />
        {config.controls.source === 'nrf24' && <LinkPanel />}
        <Panel
          title="Drive preview"
          titleId="drive-preview-title"
          description="The same control step the firmware runs: shaping, mixing, desaturation, ramp, output limit and start threshold. Drive with the sticks, the keyboard or a USB gamepad."
        >
          <Suspense fallback={<LoadingState label="Loading the drive preview…" />}>
            <DrivePreview config={engineConfig} />
          </Suspense>
        </Panel>
      </div>
    </DraftFields>
  );
}
