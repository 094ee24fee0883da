// Frames built from the published formats (REFERENCES §5), for feeding decoders.

/** SBUS: 0x0F, 16 × 11-bit channels packed least-significant bit first, flags, end byte 0x00. */
export function sbusFrame(channels: number[], flags = 0): number[] {
  const frame = [0x0f];
  let bits = 0;
  let count = 0;
  for (let i = 0; i < 16; i++) {
    bits |= (channels[i] ?? 992) << count;
    count += 11;
    while (count >= 8) {
      frame.push(bits & 0xff);
      bits >>>= 8;
      count -= 8;
    }
  }
  frame.push(flags, 0x00);
  return frame;
}

/** iBUS: 0x20 0x40, 14 little-endian channels, checksum 0xFFFF − sum of bytes 0..29, little-endian. */
export function ibusFrame(channels: number[]): number[] {
  const frame = [0x20, 0x40];
  for (let i = 0; i < 14; i++) {
    const value = channels[i] ?? 1500;
    frame.push(value & 0xff, value >> 8);
  }
  const sum = frame.reduce((a, b) => a + b, 0);
  const checksum = (0xffff - sum) & 0xffff;
  frame.push(checksum & 0xff, checksum >> 8);
  return frame;
}

export const parseHex = (text: string) =>
  text
    .trim()
    .split(/\s+/)
    .map((b) => parseInt(b, 16));

// REFERENCES §5 [derived]: SBUS frame with every channel 992.
export const SBUS_ALL_992 = parseHex('0F E0 03 1F F8 C0 07 3E F0 81 0F 7C E0 03 1F F8 C0 07 3E F0 81 0F 7C 00 00');
// REFERENCES §5 [seen, checksum verified]: the published iBUS example frame.
export const IBUS_EXAMPLE = parseHex(
  '20 40 DB 05 DC 05 54 05 DC 05 E8 03 D0 07 D2 05 E8 03 DC 05 DC 05 DC 05 DC 05 DC 05 DC 05 DA F3',
);
export const IBUS_EXAMPLE_CHANNELS = [
  1499, 1500, 1364, 1500, 1000, 2000, 1490, 1000, 1500, 1500, 1500, 1500, 1500, 1500,
];
