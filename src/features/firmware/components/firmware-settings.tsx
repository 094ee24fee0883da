import { FirmwareSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { Panel } from '@/components/ui/panel';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';

type Firmware = RobotConfig['firmware'];

const BAUD_OPTIONS = [9600, 57600, 115200].map((b) => ({
  value: String(b),
  label: `${b.toLocaleString('en-GB')} baud`,
}));

/** Why a sketch name is refused (the schema's own words), or undefined. */
function sketchNameError(name: string | null): string | undefined {
  const result = FirmwareSchema.shape.sketchName.safeParse(name);
  return result.success ? undefined : result.error.issues[0].message;
}

/** Why a health-line interval is refused, or undefined (limits from FirmwareSchema). */
function intervalError(ms: number): string | undefined {
  if (Number.isNaN(ms)) return 'Enter a number';
  if (!Number.isInteger(ms)) return 'Use a whole number of milliseconds';
  return FirmwareSchema.shape.diagnosticsIntervalMs.safeParse(ms).success ? undefined : 'Between 250 and 60,000 ms';
}

export interface FirmwareSettingsProps {
  config: RobotConfig;
  onChange: (next: RobotConfig) => void;
  canEdit: boolean;
  /** The folder name made from the robot's name, shown when no sketch name is set. */
  derivedName: string | null;
}

/** The sketch's name and what the firmware prints on its serial port. */
export function FirmwareSettings({ config, onChange, canEdit, derivedName }: FirmwareSettingsProps) {
  const fw = config.firmware;
  const set = (patch: Partial<Firmware>) => onChange({ ...config, firmware: { ...fw, ...patch } });
  return (
    <Panel title="Sketch and serial port" titleId="fw-settings-title">
      <fieldset disabled={!canEdit} className="grid gap-4 sm:grid-cols-2">
        <div data-field="firmware.sketchName" className="sm:col-span-2">
          <TextField
            label="Sketch name"
            value={fw.sketchName ?? ''}
            placeholder={derivedName ?? undefined}
            spellCheck={false}
            onChange={(e) => set({ sketchName: e.target.value === '' ? null : e.target.value })}
            error={sketchNameError(fw.sketchName)}
            hint={`The folder and .ino name the Arduino IDE opens. Left empty, it is made from the robot's name${derivedName ? ` ("${derivedName}")` : ''}.`}
          />
        </div>
        <label data-field="firmware.serialDiagnostics" className="flex items-start gap-2 text-sm sm:col-span-2">
          <input
            type="checkbox"
            className="mt-0.5 size-4 accent-accent"
            checked={fw.serialDiagnostics}
            onChange={(e) => set({ serialDiagnostics: e.target.checked })}
          />
          <span>
            <span className="font-semibold text-ink-soft">Print link health on the serial port</span>
            <span className="block text-ink-muted">
              Good and bad frames, time since the last good frame and retries, at a slow rate.
            </span>
          </span>
        </label>
        <div data-field="firmware.diagnosticsIntervalMs">
          <TextField
            label="Health line every (ms)"
            type="number"
            inputMode="numeric"
            min={250}
            max={60000}
            step={250}
            disabled={!fw.serialDiagnostics}
            value={Number.isFinite(fw.diagnosticsIntervalMs) ? fw.diagnosticsIntervalMs : ''}
            onChange={(e) =>
              set({ diagnosticsIntervalMs: e.target.value === '' ? Number.NaN : Number(e.target.value) })
            }
            error={intervalError(fw.diagnosticsIntervalMs)}
          />
        </div>
        <div data-field="firmware.serialBaud">
          <SelectField
            label="Serial speed"
            options={BAUD_OPTIONS}
            value={String(fw.serialBaud)}
            onChange={(e) => set({ serialBaud: Number(e.target.value) as Firmware['serialBaud'] })}
            hint="Set the serial monitor to the same speed."
          />
        </div>
      </fieldset>
    </Panel>
  );
}
