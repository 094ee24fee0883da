import { useMemo, useRef } from 'react';
import { PRESET_PARAM_SCHEMAS } from '@shared/kinematics/presets';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { issuesByPath } from '../lib/field-errors';

/**
 * The draft checked with the server's schema, and a starter layout's parameters with their own
 * schema (the server only needs the wheel table they built, but a bad parameter must not be saved).
 */
export function checkDraft(config: RobotConfig) {
  const result = RobotConfigSchema.safeParse(config);
  const fieldErrors = result.success ? {} : issuesByPath(result.error.issues);
  const layout = config.chassis?.layout;
  if (layout && layout !== 'custom') {
    const params = PRESET_PARAM_SCHEMAS[layout].safeParse(config.chassis.params ?? {});
    if (!params.success)
      Object.assign(
        fieldErrors,
        issuesByPath(params.error.issues.map((i) => ({ ...i, path: ['chassis', 'params', ...i.path] }))),
      );
  }
  const valid = result.success && Object.keys(fieldErrors).length === 0 ? result.data : null;
  return { valid, fieldErrors };
}

export interface DraftValidation {
  /** The draft, parsed, when it passes the schema. */
  valid: RobotConfig | null;
  /** The newest draft that passed: what the engine and drawings use while a field is being fixed. */
  validConfig: RobotConfig;
  /** The schema's reasons, by dotted path. */
  fieldErrors: Record<string, string>;
}

/** Checks the draft with the same schema the server uses. */
export function useDraftValidation(config: RobotConfig, fallback: RobotConfig): DraftValidation {
  const { valid, fieldErrors } = useMemo(() => checkDraft(config), [config]);
  const lastValid = useRef<RobotConfig>(fallback);
  if (valid) lastValid.current = valid;
  return { valid, validConfig: lastValid.current, fieldErrors };
}
