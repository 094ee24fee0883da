// The configuration hash the firmware prints at boot has one definition, in shared/, so the
// generator and the boot-line lookup cannot disagree.
export { canonicalJson, configHash } from '@shared/history/config-hash';
