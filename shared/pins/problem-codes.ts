/**
 * Stable codes of the pin check, power advice and their default severity. The command line,
 * saved links and tests rely on these strings; add new ones, never rename.
 */
export const PIN_PROBLEM_CODES = {
  'pin-missing': 'error',
  'status-led-missing': 'warning',
  'pin-unknown': 'error',
  'pin-cannot-do-role': 'error',
  'pin-flash': 'error',
  'pin-input-only': 'error',
  'pin-strapping': 'warning',
  'pin-used-twice': 'error',
  'pin-on-spi-bus': 'error',
  'spi-ss-not-output': 'error',
  'pin-on-usb-serial': 'error',
  'pin-shares-usb-serial': 'warning',
  'servo-timer-pwm': 'error',
  'timer0-millis': 'error',
  'timer-frequency-clash': 'error',
  'timer-frequency-changes-others': 'warning',
  'pwm-frequency-not-exact': 'warning',
  'pwm-frequency-above-driver-max': 'error',
  'pwm-frequency-ignored': 'warning',
  'slice-channel-shared': 'error',
  'slice-frequency-clash': 'error',
  'ledc-channels-exhausted': 'error',
  'too-few-pwm-pins': 'error',
  'logic-level-too-low': 'warning',
  'motor-not-on-driver': 'error',
  'motor-on-two-drivers': 'error',
  'driver-motor-unknown': 'error',
  'driver-too-many-motors': 'error',
  'sbus-needs-inverter': 'warning',
  'stop-mode-unsupported': 'warning',
  'role-unknown': 'warning',
} as const;

export type PinProblemCode = keyof typeof PIN_PROBLEM_CODES;
