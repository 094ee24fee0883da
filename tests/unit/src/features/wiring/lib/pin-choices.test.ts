import { describe, expect, it } from 'vitest';
import { allPinChoices } from '@/features/wiring/lib/pin-choices';
import { esp32Plan } from '../../../../../fixtures/pin-plans';
import { buildConfig, withPins } from '../../../../../fixtures/robot-config-factory';

const ids = (list: { pin: { id: string } }[]) => list.map((c) => c.pin.id);
const noteOf = (list: { pin: { id: string }; note: string }[], id: string) => list.find((c) => c.pin.id === id)?.note;

describe('pin choices', () => {
  it('never offers an ESP32 input-only or flash pin for an output, and says why', () => {
    const choices = allPinChoices(esp32Plan()).get('driver:0:a.dir')!;
    // ESP-IDF GPIO notes: GPIO 34–39 are input only; GPIO 6–11 are wired to the SPI flash.
    expect(ids(choices.suits)).not.toContain('GPIO34');
    expect(noteOf(choices.others, 'GPIO34')).toBe('is an input only');
    expect(noteOf(choices.others, 'GPIO6')).toBe('is wired to the flash memory');
    expect(noteOf(choices.others, 'GPIO12')).toMatch(/^is a boot strapping pin/);
  });

  it('offers an input-only pin for the receiver, which only reads', () => {
    const choices = allPinChoices(esp32Plan()).get('input:ppm')!;
    expect(ids(choices.suits)).toContain('GPIO34');
  });

  it('counts a pin held by another role as a problem, naming that role', () => {
    const choices = allPinChoices(esp32Plan()).get('driver:0:a.dir')!;
    expect(ids(choices.suits)).not.toContain('GPIO25');
    expect(noteOf(choices.others, 'GPIO25')).toBe('already used for Driver 1 A PWM');
  });

  it('keeps a second PWM role off the RP2040 slice channel another role drives', () => {
    // RP2040 datasheet, PWM: slice = (gpio >> 1) & 7, channel = gpio & 1, so GP2 and GP18 share 1A.
    const config = withPins(buildConfig({ board: 'rp2040-pico', driver: 'pwm-dir', source: 'ppm' }), {
      'Driver 1/a.pwm': 'GP2',
    });
    const choices = allPinChoices(config).get('driver:0:b.pwm')!;
    expect(ids(choices.suits)).not.toContain('GP18');
    expect(noteOf(choices.others, 'GP18')).toMatch(/slice 1 channel A/);
    expect(ids(choices.suits)).toContain('GP3');
  });

  it('lets chips of one kind share their standby pin', () => {
    const config = withPins(
      buildConfig({ layout: 'quad-mecanum', board: 'mega2560', driver: 'pwm-in1-in2-stby', source: 'ppm' }),
      { 'Driver 1/stby': 'D30' },
    );
    const choices = allPinChoices(config).get('driver:1:stby')!;
    expect(ids(choices.suits)).toContain('D30');
    expect(noteOf(choices.suits, 'D30')).toBe('digital output (shared with Driver 1 Standby)');
  });
});
