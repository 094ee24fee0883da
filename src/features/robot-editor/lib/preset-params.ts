import type { z } from 'zod';
import { PRESET_PARAM_SCHEMAS } from '@shared/kinematics/presets';
import type { DriveLayoutId } from '@shared/schemas/ids';

/** One starter-layout parameter as a form field, read from its schema. */
export type PresetParamField =
  | { key: string; label: string; unit?: string; kind: 'number'; min?: number; max?: number }
  | { key: string; label: string; kind: 'choice'; options: { value: string | number; label: string }[] };

// Words for choice values the schemas spell as ids.
const CHOICE_WORDS: Record<string, string> = {
  front: 'Front',
  rear: 'Rear',
  left: 'Left',
  right: 'Right',
  'omni-wheels': 'Omni wheels',
  'omni-tracks': 'Omni tracks',
  wheels: 'Wheels',
  tracks: 'Tracks',
  x: 'X: top rollers point to the centre',
  o: 'O: top rollers ring the centre',
};

type Inner = z.ZodType & {
  def: { type: string };
  options?: unknown[];
  minValue?: number | null;
  maxValue?: number | null;
};

/** The parameters of a starter layout, in schema order, with labels and units from the schema's descriptions. */
export function presetParamFields(layout: DriveLayoutId): PresetParamField[] {
  const shape = PRESET_PARAM_SCHEMAS[layout].shape as Record<string, z.ZodDefault>;
  return Object.entries(shape).map(([key, schema]) => {
    const described = schema.description ?? key;
    const unitMatch = /\(([^)]+)\)$/.exec(described);
    const label = unitMatch ? described.slice(0, unitMatch.index).trim() : described;
    const inner = schema.unwrap() as Inner;
    if (inner.def.type === 'number') {
      return {
        key,
        label,
        unit: unitMatch?.[1],
        kind: 'number',
        min: inner.minValue ?? undefined,
        max: inner.maxValue ?? undefined,
      };
    }
    const options = (inner.options ?? []).map((o) => {
      const value =
        typeof o === 'object' && o !== null && 'value' in o
          ? (o as { value: string | number }).value
          : (o as string | number);
      return { value, label: CHOICE_WORDS[String(value)] ?? String(value) };
    });
    return { key, label, kind: 'choice', options };
  });
}

/** Parameters checked against the layout's schema: the filled-in values, or the reasons by key. */
export function checkPresetParams(
  layout: DriveLayoutId,
  params: Record<string, unknown>,
): { ok: true; params: Record<string, number | string> } | { ok: false; errors: Record<string, string> } {
  const result = PRESET_PARAM_SCHEMAS[layout].safeParse(params);
  if (result.success) return { ok: true, params: result.data as Record<string, number | string> };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = String(issue.path[0] ?? '');
    errors[key] ??= issue.message.startsWith('Invalid input') ? 'Enter a number' : issue.message;
  }
  return { ok: false, errors };
}
