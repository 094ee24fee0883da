/** Printed in every generated file, the boot line and manifest.json. Raise it when generated code changes. */
export const FIRMWARE_GENERATOR_VERSION = '0.1.0';
