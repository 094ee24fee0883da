import { z } from 'zod';

// These ids are a contract: saved files, the command line and generated firmware all use them.

export const DRIVE_LAYOUT_IDS = [
  'trio-omni',
  'quad-mecanum',
  'quad-omni-x',
  'differential',
  'skid-steer',
  'h-drive',
] as const;
export const DriveLayoutIdSchema = z.enum(DRIVE_LAYOUT_IDS);
export type DriveLayoutId = z.infer<typeof DriveLayoutIdSchema>;

/** A chassis is either one of the starter layouts or a custom wheel table. */
export const ChassisLayoutSchema = z.enum([...DRIVE_LAYOUT_IDS, 'custom']);
export type ChassisLayout = z.infer<typeof ChassisLayoutSchema>;

export const BOARD_IDS = ['uno', 'nano', 'mega2560', 'esp32-devkitc', 'rp2040-pico'] as const;
export const BoardIdSchema = z.enum(BOARD_IDS);
export type BoardId = z.infer<typeof BoardIdSchema>;

export const INPUT_SOURCE_IDS = ['rc-pwm', 'ppm', 'sbus', 'ibus', 'nrf24'] as const;
export const InputSourceIdSchema = z.enum(INPUT_SOURCE_IDS);
export type InputSourceId = z.infer<typeof InputSourceIdSchema>;

export const DRIVER_KIND_IDS = [
  'dual-pwm',
  'pwm-dir',
  'en-in1-in2',
  'pwm-in1-in2-stby',
  'two-input',
  'servo-esc',
] as const;
export const DriverKindIdSchema = z.enum(DRIVER_KIND_IDS);
export type DriverKindId = z.infer<typeof DriverKindIdSchema>;

/**
 * omni: rollers at 0° (free sideways); mecanum: rollers at ±45°; fixed: a plain wheel;
 * track: a plain track (skids when turning); omni-track: a track whose links carry free
 * rollers, which moves like an omni wheel.
 */
export const WHEEL_KINDS = ['omni', 'mecanum', 'fixed', 'track', 'omni-track'] as const;
export const WheelKindSchema = z.enum(WHEEL_KINDS);
export type WheelKind = z.infer<typeof WheelKindSchema>;

export const STICK_AXES = ['forward', 'strafe', 'yaw'] as const;
export type StickAxis = (typeof STICK_AXES)[number];
