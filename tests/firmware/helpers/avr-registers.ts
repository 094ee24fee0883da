// ATmega328P data-space register addresses (ATmega328P datasheet, register summary) and how
// the Arduino core drives a pin: analogWrite() connects the timer output (COMnx1 set in
// TCCRnA) with OCRnx = duty, except 0 and 255, which it writes as plain LOW and HIGH.

export const PORTB = 0x25;
export const PORTC = 0x28;
export const PORTD = 0x2b;
export const GPIOR0 = 0x3e;

interface PwmOutput {
  tccra: number;
  comBit: number;
  ocr: number;
}

// Timer 1 (16 bits): TCCR1B 0x81 (WGM13 is bit 4), ICR1 0x86/0x87, OCR1A 0x88/0x89, OCR1B 0x8A/0x8B.
export const TCCR1B = 0x81;
export const ICR1L = 0x86;
const TIMER1_HIGH_BYTES = [0x87, 0x89, 0x8b];

/** Uno timer outputs (digital_pin_to_timer_PGM in the core's standard variant). */
const UNO_PWM: Record<number, PwmOutput> = {
  6: { tccra: 0x44, comBit: 7, ocr: 0x47 },
  5: { tccra: 0x44, comBit: 5, ocr: 0x48 },
  9: { tccra: 0x80, comBit: 7, ocr: 0x88 },
  10: { tccra: 0x80, comBit: 5, ocr: 0x8a },
  11: { tccra: 0xb0, comBit: 7, ocr: 0xb3 },
  3: { tccra: 0xb0, comBit: 5, ocr: 0xb4 },
};

/** Arduino pin number (as code writes it: '9', 'A0') → port register, port letter and bit on the Uno. */
export function unoPort(code: string): { register: number; port: string; bit: number } {
  const n = code.startsWith('A') ? 14 + Number(code.slice(1)) : Number(code);
  if (n < 8) return { register: PORTD, port: 'D', bit: n };
  if (n < 14) return { register: PORTB, port: 'B', bit: n - 8 };
  return { register: PORTC, port: 'C', bit: n - 14 };
}

/** Registers to dump so that every pin's level or duty can be read back. */
export function unoRegisters(): number[] {
  const pwm = Object.values(UNO_PWM).flatMap((o) => [o.tccra, o.ocr]);
  return [...new Set([PORTB, PORTC, PORTD, TCCR1B, ICR1L, ...TIMER1_HIGH_BYTES, ...pwm])].sort((a, b) => a - b);
}

const word = (regs: Record<number, number>, low: number) => regs[low] | ((regs[low + 1] ?? 0) << 8);

/**
 * The duty on a pin as 0..255: what analogWrite() set, or the digital level as 0 / 255. When
 * timer 1 runs with ICR1 as TOP (mode 10, a chosen PWM frequency), OCR1x / ICR1 scaled to 255.
 */
export function unoPinDuty(code: string, regs: Record<number, number>): number {
  const out = UNO_PWM[Number(code)];
  if (out && (regs[out.tccra] >> out.comBit) & 1) {
    if (out.tccra === 0x80 && (regs[TCCR1B] >> 4) & 1) return (word(regs, out.ocr) * 255) / word(regs, ICR1L);
    return regs[out.ocr];
  }
  const { register, bit } = unoPort(code);
  return (regs[register] >> bit) & 1 ? 255 : 0;
}
