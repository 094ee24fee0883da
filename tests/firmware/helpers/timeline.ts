import type { SimEvent } from '../sim/simavr';
import { cyclesPerMs } from '../sim/simavr';
import { ibusFrame, sbusFrame } from './frames';

export type Raw = Record<number, number>;

/** Builds a simulator script in milliseconds: receiver frames every few ms, dumps by name. */
export class Timeline {
  readonly events: SimEvent[] = [];

  constructor(
    private readonly source: 'ibus' | 'sbus',
    readonly frameMs = 7,
  ) {}

  private frame(raw: Raw, corrupt: boolean, flags: number): number[] {
    const centre = this.source === 'ibus' ? 1500 : 992;
    const channels = Array.from({ length: 16 }, (_, i) => raw[i + 1] ?? centre);
    const bytes = this.source === 'ibus' ? ibusFrame(channels) : sbusFrame(channels, flags);
    if (corrupt) bytes[bytes.length - (this.source === 'ibus' ? 2 : 1)] ^= 0x5a;
    return bytes;
  }

  /** Frames with these readings from `fromMs` until just before `toMs`. */
  frames(fromMs: number, toMs: number, raw: Raw, options: { corrupt?: boolean; flags?: number } = {}): this {
    for (let t = fromMs; t < toMs; t += this.frameMs) {
      this.events.push({
        kind: 'uart',
        cycle: t * cyclesPerMs,
        bytes: this.frame(raw, options.corrupt ?? false, options.flags ?? 0),
      });
    }
    return this;
  }

  dump(atMs: number, tag: string): this {
    this.events.push({ kind: 'dump', cycle: atMs * cyclesPerMs, tag });
    return this;
  }

  pin(atMs: number, port: string, bit: number, level: 0 | 1): this {
    this.events.push({ kind: 'pin', port, bit, cycle: atMs * cyclesPerMs, level });
    return this;
  }
}

/** One input pin of the Uno: port letter and bit. */
export interface PortPin {
  port: string;
  bit: number;
}

/**
 * PPM on one pin: a 300 µs pulse starts each channel, the channel's width later the next one
 * starts, and after the last channel a sync gap fills the 22.5 ms frame (REFERENCES §5).
 */
export function ppmFrames(t: Timeline, pin: PortPin, fromMs: number, toMs: number, widthsUs: number[]): void {
  for (let frameUs = fromMs * 1000; frameUs + 22_500 <= toMs * 1000; frameUs += 22_500) {
    let edgeUs = frameUs;
    for (const width of [...widthsUs, 0]) {
      t.pin(edgeUs / 1000, pin.port, pin.bit, 1).pin((edgeUs + 300) / 1000, pin.port, pin.bit, 0);
      edgeUs += width;
    }
  }
}

/** Servo pulses on one wire per channel, every 20 ms, channels one after another. */
export function rcFrames(t: Timeline, pins: PortPin[], fromMs: number, toMs: number, widthsUs: number[]): void {
  for (let frameUs = fromMs * 1000; frameUs + 20_000 <= toMs * 1000; frameUs += 20_000) {
    let startUs = frameUs;
    pins.forEach((pin, i) => {
      t.pin(startUs / 1000, pin.port, pin.bit, 1).pin((startUs + widthsUs[i]) / 1000, pin.port, pin.bit, 0);
      startUs += widthsUs[i] + 100;
    });
  }
}
