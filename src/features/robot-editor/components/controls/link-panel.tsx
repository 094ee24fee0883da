import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import { BOARDS } from '@shared/boards/boards';
import { BOARD_IDS } from '@shared/schemas/ids';
import { randomLinkAddress } from '../../lib/controls-edits';
import { DraftNumberField, DraftSelectField, DraftTextField } from '../fields/draft-fields';
import { useDraftFields } from '../fields/draft-fields-context';

const DATA_RATES = [
  { value: '250k', label: '250 kbit/s (longest range)' },
  { value: '1M', label: '1 Mbit/s' },
  { value: '2M', label: '2 Mbit/s' },
];

/** The home-made 2.4 GHz link: radio channel, data rate, the robot's address and the remote. */
export function LinkPanel() {
  const { config, set, disabled } = useDraftFields();
  const link = config.controls.link;
  const mhz = Number.isInteger(link.rfChannel) ? 2400 + link.rfChannel : null;
  return (
    <Panel
      title="2.4 GHz link"
      titleId="link-title"
      description="Robot and remote must share these; the remote's sketch is generated from the same settings."
    >
      <div className="flex flex-wrap gap-x-5">
        {/* nRF24L01+ Product Specification: RF channel frequency F0 = 2400 + RF_CH MHz, RF_CH 0–125. */}
        <DraftNumberField
          path={['controls', 'link', 'rfChannel']}
          label="RF channel"
          hint={mhz !== null ? `${mhz} MHz` : '0 to 125'}
          width="w-16"
        />
        <DraftSelectField path={['controls', 'link', 'dataRate']} label="Data rate" options={DATA_RATES} width="w-52" />
        <DraftNumberField
          path={['controls', 'link', 'sendRateHz']}
          label="Send rate"
          unit="Hz"
          hint="Packets per second from the remote"
          width="w-16"
        />
        <DraftSelectField
          path={['controls', 'link', 'remoteBoard']}
          label="Remote board"
          options={BOARD_IDS.map((id) => ({ value: id, label: BOARDS[id].name }))}
          width="w-56"
        />
      </div>
      <div className="flex flex-wrap items-start gap-x-3">
        <DraftTextField
          path={['controls', 'link', 'address']}
          label="Address (5 bytes, hex)"
          hint="Unique per robot, so two remotes never drive one robot."
          width="w-36 font-mono"
        />
        {!disabled && (
          <Button
            size="sm"
            variant="secondary"
            className="mt-7"
            onClick={() => set(['controls', 'link', 'address'], randomLinkAddress())}
          >
            New random address
          </Button>
        )}
      </div>
    </Panel>
  );
}
