import { renderBundle } from '@server/features/firmware/render-bundle';
import type { TextFile } from '@shared/history/file-diff';
import type { RobotConfig } from '@shared/schemas/robot-config';

/** Renders a firmware bundle's files for a configuration. */
export type BundleRenderer = (config: RobotConfig, options: { revision: number }) => TextFile[];

/** The firmware generator the diff uses for the generated files (tests may hand in their own). */
export const bundleRenderer: BundleRenderer | null = renderBundle;
