import { describe, expect, it } from 'vitest';
import { BOARDS, defaultPwmHz, findPin, getBoard, servoTimers, timerOfPin } from '@shared/boards/boards';
import { rp2040Slice } from '@shared/boards/rp2040-pico';
import { BOARD_IDS } from '@shared/schemas/ids';

const ids = (filter: (p: ReturnType<typeof getBoard>['pins'][number]) => boolean, board: ReturnType<typeof getBoard>) =>
  board.pins.filter(filter).map((p) => p.id);

describe('board catalogue', () => {
  it('has a profile for every board id, under its own id', () => {
    for (const id of BOARD_IDS) expect(getBoard(id).id).toBe(id);
    expect(Object.keys(BOARDS).sort()).toEqual([...BOARD_IDS].sort());
  });

  it('gives every pin a unique id on its board', () => {
    for (const board of Object.values(BOARDS))
      expect(new Set(board.pins.map((p) => p.id)).size).toBe(board.pins.length);
  });

  it('names the bus and serial pins with ids that exist on the board', () => {
    for (const board of Object.values(BOARDS)) {
      const named = [board.spi.sck, board.spi.mosi, board.spi.miso, board.spi.ss, board.i2c.sda, board.i2c.scl];
      for (const uart of board.uarts) named.push(...[uart.rx, uart.tx].filter((p): p is string => p !== null));
      for (const t of board.timers) named.push(...t.pins);
      for (const id of named) expect(findPin(board, id), `${board.id} ${id}`).toBeDefined();
    }
  });
});

describe('Arduino AVR boards (REFERENCES §2)', () => {
  it('has PWM on 3, 5, 6, 9, 10, 11 on the Uno and the Nano', () => {
    for (const id of ['uno', 'nano'] as const)
      expect(ids((p) => !!p.pwm, getBoard(id))).toEqual(['D3', 'D5', 'D6', 'D9', 'D10', 'D11']);
  });

  it('has PWM on 2–13 and 44–46 on the Mega', () => {
    const expected = [...Array.from({ length: 12 }, (_, i) => `D${i + 2}`), 'D44', 'D45', 'D46'];
    expect(ids((p) => !!p.pwm, getBoard('mega2560'))).toEqual(expected);
  });

  it('maps timers to pins as the reference table does', () => {
    const byTimer = (id: 'uno' | 'mega2560') =>
      Object.fromEntries(getBoard(id).timers.map((t) => [t.id, [...t.pins].sort()]));
    // Uno: T0 6, 5 · T1 9, 10 · T2 11, 3.
    expect(byTimer('uno')).toEqual({ 0: ['D5', 'D6'], 1: ['D10', 'D9'], 2: ['D11', 'D3'] });
    // Mega: T0 13, 4 · T1 11, 12 · T2 10, 9 · T3 5, 2, 3 · T4 6, 7, 8 · T5 46, 45, 44.
    expect(byTimer('mega2560')).toEqual({
      0: ['D13', 'D4'],
      1: ['D11', 'D12'],
      2: ['D10', 'D9'],
      3: ['D2', 'D3', 'D5'],
      4: ['D6', 'D7', 'D8'],
      5: ['D44', 'D45', 'D46'],
    });
  });

  it('runs millis() on timer 0 and nothing else of the core on the other timers', () => {
    for (const id of ['uno', 'nano', 'mega2560'] as const) {
      const timers = getBoard(id).timers;
      expect(timers.filter((t) => t.coreUse).map((t) => t.id)).toEqual([0]);
      expect(timers[0].coreUse).toContain('millis()');
    }
  });

  it('defaults to 490.2 Hz, and 976.6 Hz on timer 0 (16 MHz/64/510 and 16 MHz/64/256)', () => {
    const uno = getBoard('uno');
    expect(defaultPwmHz(uno, findPin(uno, 'D9')!)).toBeCloseTo(490.196, 3);
    expect(defaultPwmHz(uno, findPin(uno, 'D5')!)).toBeCloseTo(976.5625, 4);
    const mega = getBoard('mega2560');
    expect(defaultPwmHz(mega, findPin(mega, 'D13')!)).toBeCloseTo(976.5625, 4);
    expect(defaultPwmHz(mega, findPin(mega, 'D44')!)).toBeCloseTo(490.196, 3);
  });

  it('gives the Servo library timer 1 on the Uno, and 5, 1, 3, 4 on the Mega, 12 servos each', () => {
    expect(servoTimers(getBoard('uno'), 1)).toEqual([1]);
    expect(servoTimers(getBoard('mega2560'), 1)).toEqual([5]);
    expect(servoTimers(getBoard('mega2560'), 13)).toEqual([5, 1]);
    expect(servoTimers(getBoard('mega2560'), 48)).toEqual([5, 1, 3, 4]);
    expect(servoTimers(getBoard('uno'), 0)).toEqual([]);
  });

  it('gives tone() timer 2', () => {
    for (const id of ['uno', 'mega2560'] as const)
      expect(getBoard(id).timers.find((t) => t.libraries.includes('tone'))?.id).toBe(2);
  });

  it('puts the Mega serial ports on 0/1, 19/18, 17/16 and 15/14 (RX/TX)', () => {
    expect(getBoard('mega2560').uarts.map((u) => [u.port, u.rx, u.tx])).toEqual([
      ['Serial', 'D0', 'D1'],
      ['Serial1', 'D19', 'D18'],
      ['Serial2', 'D17', 'D16'],
      ['Serial3', 'D15', 'D14'],
    ]);
  });

  it('makes the Nano A6 and A7 analog inputs only', () => {
    const nano = getBoard('nano');
    for (const id of ['A6', 'A7']) expect(findPin(nano, id)).toMatchObject({ digital: false, analogIn: true });
    expect(findPin(getBoard('uno'), 'A6')).toBeUndefined();
  });

  it('writes D-pins as numbers and A-pins by name in code', () => {
    const uno = getBoard('uno');
    expect(findPin(uno, 'D9')!.code).toBe('9');
    expect(findPin(uno, 'A0')!.code).toBe('A0');
  });

  it('finds the timer of a PWM pin', () => {
    const mega = getBoard('mega2560');
    expect(timerOfPin(mega, findPin(mega, 'D45')!)?.id).toBe(5);
    expect(timerOfPin(mega, findPin(mega, 'D22')!)).toBeUndefined();
  });
});

describe('ESP32 DevKitC (ESP-IDF GPIO & LEDC pages, TRM; REFERENCES §3)', () => {
  const esp = getBoard('esp32-devkitc');

  it('marks 0, 2, 5, 12 and 15 as strapping pins', () => {
    expect(ids((p) => !!p.strapping, esp)).toEqual(['GPIO0', 'GPIO2', 'GPIO5', 'GPIO12', 'GPIO15']);
  });

  it('marks 6–11 as wired to the flash', () => {
    expect(ids((p) => !!p.flash, esp)).toEqual(['GPIO6', 'GPIO7', 'GPIO8', 'GPIO9', 'GPIO10', 'GPIO11']);
  });

  it('marks 34–39 as input only, without pull-ups and without PWM', () => {
    const inputOnly = esp.pins.filter((p) => p.inputOnly);
    expect(inputOnly.map((p) => p.id)).toEqual(['GPIO34', 'GPIO35', 'GPIO36', 'GPIO39']);
    for (const p of inputOnly) expect(p).toMatchObject({ pullUp: false });
    for (const p of inputOnly) expect(p.pwm).toBeUndefined();
  });

  it('has no GPIO 20, 24, 28–31, 37 or 38 on the header', () => {
    for (const n of [20, 24, 28, 29, 30, 31, 37, 38]) expect(findPin(esp, `GPIO${n}`)).toBeUndefined();
  });

  it('puts the USB serial port on TX 1 / RX 3', () => {
    expect(esp.uarts[0]).toMatchObject({ port: 'Serial', tx: 'GPIO1', rx: 'GPIO3', usb: true });
    expect(ids((p) => !!p.usbSerial, esp)).toEqual(['GPIO1', 'GPIO3']);
  });

  it('has 16 LEDC channels and 3.3 V logic', () => {
    expect(esp.pwmUnits).toMatchObject({ kind: 'ledc', channels: 16 });
    expect(esp.logicVolts).toBe(3.3);
    expect(esp.fiveVoltTolerant).toBe(false);
  });
});

describe('Raspberry Pi Pico (RP2040 datasheet PWM chapter; REFERENCES §4)', () => {
  const pico = getBoard('rp2040-pico');

  it('puts GPIO 0 on 0A, 1 on 0B, 15 on 7B, 16 on 0A and 25 on 4B', () => {
    expect(rp2040Slice(0)).toEqual({ slice: 0, channel: 'A' });
    expect(rp2040Slice(1)).toEqual({ slice: 0, channel: 'B' });
    expect(rp2040Slice(15)).toEqual({ slice: 7, channel: 'B' });
    expect(rp2040Slice(16)).toEqual({ slice: 0, channel: 'A' });
    expect(rp2040Slice(25)).toEqual({ slice: 4, channel: 'B' });
  });

  it('stores the slice in every pin profile', () => {
    expect(findPin(pico, 'GP15')!.pwm).toEqual({ slice: 7, channel: 'B' });
    expect(findPin(pico, 'GP25')!.pwm).toEqual({ slice: 4, channel: 'B' });
  });

  it('gives every GPIO PWM, and shares each slice channel between GPIO n and n + 16', () => {
    const header = pico.pins.filter((p) => p.onHeader);
    for (const p of header) expect(p.pwm).toBeDefined();
    const pairs = [0, 1, 2, 3, 4, 5, 6, 10, 11, 12].map((n) => [
      findPin(pico, `GP${n}`)!,
      findPin(pico, `GP${n + 16}`)!,
    ]);
    for (const [low, high] of pairs) expect(low.pwm).toEqual(high.pwm);
  });

  it('keeps the LED pin GP25 off the header', () => {
    expect(findPin(pico, 'GP25')).toMatchObject({ builtinLed: true, onHeader: false });
  });

  it('has 3.3 V logic that is not 5 V tolerant', () => {
    expect(pico.logicVolts).toBe(3.3);
    expect(pico.fiveVoltTolerant).toBe(false);
  });

  it('offers UART receive on GP1, GP5, GP9, GP13, GP17 and GP21', () => {
    expect(ids((p) => p.onHeader && !!p.uart?.some((u) => u.role === 'rx'), pico)).toEqual([
      'GP1',
      'GP5',
      'GP9',
      'GP13',
      'GP17',
      'GP21',
    ]);
  });
});
