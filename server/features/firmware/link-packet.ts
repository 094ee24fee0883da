// The home-made 2.4 GHz link's packet: one description from which the robot's decoder and
// the remote's encoder are both generated, so both sides agree byte for byte whatever
// their word size. Fixed-size fields only, little-endian, no padding.

export type LinkFieldType = 'u8' | 'u16';

export interface LinkField {
  /** camelCase name in TypeScript; the C member is its snake_case form. */
  name: string;
  type: LinkFieldType;
  count: number;
  doc: string;
}

/** Raise whenever the layout changes; a robot drops packets of any other version. */
export const LINK_PACKET_VERSION = 1;
export const LINK_CHANNEL_COUNT = 8;
/** Highest channel reading: the remote sends 10-bit ADC readings. */
export const LINK_CHANNEL_MAX = 1023;

export const LINK_PACKET_FIELDS: readonly LinkField[] = [
  { name: 'version', type: 'u8', count: 1, doc: 'layout version; other versions are dropped' },
  { name: 'robotTag', type: 'u16', count: 1, doc: "low 16 bits of the robot's link address" },
  { name: 'sequence', type: 'u16', count: 1, doc: 'one more for each packet; a gap means lost packets' },
  { name: 'channels', type: 'u16', count: LINK_CHANNEL_COUNT, doc: 'readings 0..1023, channel 1 first' },
  { name: 'retries', type: 'u8', count: 1, doc: 'retransmissions the previous packet needed' },
  { name: 'checksum', type: 'u16', count: 1, doc: 'CRC-16/CCITT-FALSE of every byte before it' },
];

export interface LaidOutField extends LinkField {
  offset: number;
  /** Bytes of one element. */
  size: 1 | 2;
  cName: string;
  cType: 'uint8_t' | 'uint16_t';
}

export function linkPacketLayout(): { fields: LaidOutField[]; size: number } {
  let offset = 0;
  const fields = LINK_PACKET_FIELDS.map((field) => {
    const size = field.type === 'u8' ? 1 : 2;
    const laid: LaidOutField = {
      ...field,
      offset,
      size,
      cName: field.name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`),
      cType: size === 1 ? 'uint8_t' : 'uint16_t',
    };
    offset += size * field.count;
    return laid;
  });
  // nRF24L01+ product specification v1.0: a payload holds at most 32 bytes.
  if (offset > 32) throw new Error(`The link packet is ${offset} bytes; an nRF24L01+ payload holds at most 32`);
  return { fields, size: offset };
}

/**
 * CRC-16/CCITT-FALSE: polynomial 0x1021, initial value 0xFFFF, no reflection, no final XOR.
 * Its catalogued check value is 0x29B1 for the ASCII bytes "123456789" (from memory).
 */
export function crc16CcittFalse(bytes: Uint8Array, length = bytes.length): number {
  let crc = 0xffff;
  for (let i = 0; i < length; i++) {
    crc ^= bytes[i] << 8;
    for (let bit = 0; bit < 8; bit++) crc = crc & 0x8000 ? ((crc << 1) ^ 0x1021) & 0xffff : (crc << 1) & 0xffff;
  }
  return crc;
}

export interface LinkPacketValues {
  robotTag: number;
  sequence: number;
  channels: number[];
  retries: number;
  /** Defaults to the current version; tests send others. */
  version?: number;
}

/** The packet bytes, checksum included (what the remote sends). */
export function encodeLinkPacket(values: LinkPacketValues): Uint8Array {
  const { fields, size } = linkPacketLayout();
  const bytes = new Uint8Array(size);
  const put = (field: LaidOutField, index: number, value: number) => {
    const at = field.offset + index * field.size;
    bytes[at] = value & 0xff;
    if (field.size === 2) bytes[at + 1] = (value >> 8) & 0xff;
  };
  for (const field of fields) {
    if (field.name === 'checksum') continue;
    for (let i = 0; i < field.count; i++) {
      const value =
        field.name === 'version'
          ? (values.version ?? LINK_PACKET_VERSION)
          : field.name === 'channels'
            ? (values.channels[i] ?? 0)
            : (values as unknown as Record<string, number>)[field.name];
      put(field, i, value);
    }
  }
  const checksum = fields.find((f) => f.name === 'checksum')!;
  put(checksum, 0, crc16CcittFalse(bytes, checksum.offset));
  return bytes;
}

/** The 16-bit robot tag from a link address (ten hex digits): its last two bytes. */
export function robotTagOf(address: string): number {
  return parseInt(address.slice(-4), 16);
}

/** The five address bytes as the nRF24L01+ takes them: least-significant byte first. */
export function addressBytes(address: string): number[] {
  const bytes: number[] = [];
  for (let i = address.length - 2; i >= 0; i -= 2) bytes.push(parseInt(address.slice(i, i + 2), 16));
  return bytes;
}

/** What the packet header template needs, computed here so the template only places it. */
export function linkPacketTemplateData() {
  const { fields, size } = linkPacketLayout();
  return {
    version: LINK_PACKET_VERSION,
    size,
    channelCount: LINK_CHANNEL_COUNT,
    checksumOffset: fields.find((f) => f.name === 'checksum')!.offset,
    fields: fields.map((f) => ({
      cName: f.cName,
      cType: f.cType,
      count: f.count,
      offset: f.offset,
      doc: f.doc,
      isArray: f.count > 1,
      isWide: f.size === 2,
      isChecksum: f.name === 'checksum',
    })),
  };
}
