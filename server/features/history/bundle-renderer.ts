import type { TextFile } from '@shared/history/file-diff';
import type { RobotConfig } from '@shared/schemas/robot-config';

/** Renders a firmware bundle's files for a configuration (the firmware generator's renderBundle). */
export type BundleRenderer = (config: RobotConfig, options: { revision: number }) => TextFile[];

/**
 * The firmware generator the diff uses for the generated files. It is null until the generator
 * is part of this server; then this becomes its `renderBundle`, and every diff gains the
 * side-by-side files without further change.
 */
export const bundleRenderer: BundleRenderer | null = null;
