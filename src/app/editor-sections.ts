import { lazy } from 'react';
import type { SectionRegistry } from '@/lib/editor-sections';

/**
 * The robot editor's sections in this build, each loaded when first opened. The navigation
 * shows them in the editor's fixed order (Chassis, Controls, Wiring, Safety, Commissioning,
 * Firmware, History), whatever the order here; a section joins with one line.
 */
export const EDITOR_SECTIONS: SectionRegistry = {
  chassis: lazy(async () => ({
    default: (await import('@/features/robot-editor/sections/chassis-section')).ChassisSection,
  })),
  controls: lazy(async () => ({
    default: (await import('@/features/robot-editor/sections/controls-section')).ControlsSection,
  })),
  wiring: lazy(async () => ({
    default: (await import('@/features/wiring/components/wiring-section')).WiringSection,
  })),
  safety: lazy(async () => ({
    default: (await import('@/features/robot-editor/sections/safety-section')).SafetySection,
  })),
  commissioning: lazy(async () => ({
    default: (await import('@/features/robot-editor/sections/commissioning-section')).CommissioningSection,
  })),
  firmware: lazy(async () => ({
    default: (await import('@/features/firmware/components/firmware-section')).FirmwareSection,
  })),
  history: lazy(async () => ({
    default: (await import('./sections/history-section')).HistorySection,
  })),
};
