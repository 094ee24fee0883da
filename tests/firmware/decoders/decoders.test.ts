import { beforeAll, describe, expect, it } from 'vitest';
import { crc16CcittFalse, encodeLinkPacket, LINK_PACKET_VERSION } from '@server/features/firmware/link-packet';
import { IBUS_EXAMPLE, IBUS_EXAMPLE_CHANNELS, SBUS_ALL_992, ibusFrame, sbusFrame } from '../helpers/frames';
import { compileHostProgram, hex, renderDecoderHeaders, runProbe } from '../helpers/host-probe';

// The decoders are plain C++ with no hardware access, so they are compiled for the host with
// g++ -Wall -Wextra -Werror and fed frames built from the published formats (REFERENCES §5).

interface Report {
  kind: string;
  result: number;
  flags?: number;
  channels: number[];
  sequence?: number;
  retries?: number;
  bytes?: string;
}
const OK = 1;
const BAD = 2;
const LOST = 3;
const FAILSAFE = 4;

let probe: string;
const run = (lines: string[]) => runProbe<Report>(probe, lines);

beforeAll(async () => {
  const dir = await renderDecoderHeaders();
  probe = await compileHostProgram(new URL('./decoder-probe.cpp', import.meta.url).pathname, dir);
});

describe('the SBUS decoder', () => {
  it('reads the published all-992 frame as sixteen channels at 992', async () => {
    const [report] = await run([`sbus 1000 ${hex(SBUS_ALL_992)}`]);
    expect(report.result).toBe(OK);
    expect(report.channels).toEqual(new Array(16).fill(992));
  });

  it('builds the same bytes as the published all-992 frame', () => {
    expect(sbusFrame(new Array(16).fill(992))).toEqual(SBUS_ALL_992);
  });

  it('unpacks every channel of a frame with distinct values, including the 172 and 1811 ends', async () => {
    const channels = [172, 1811, 992, 0, 2047, 1, 1024, 500, 1500, 333, 1700, 200, 1000, 1234, 777, 1811];
    const [report] = await run([`sbus 0 ${hex(sbusFrame(channels))}`]);
    expect(report).toMatchObject({ result: OK, channels });
  });

  it('reports a frame with the lost-frame flag as lost', async () => {
    const [report] = await run([`sbus 0 ${hex(sbusFrame([], 0x04))}`]);
    expect(report.result).toBe(LOST);
  });

  it("reports a frame with the failsafe flag as the receiver's failsafe", async () => {
    const [report] = await run([`sbus 0 ${hex(sbusFrame([], 0x08))}`]);
    expect(report.result).toBe(FAILSAFE);
  });

  it('rejects a frame whose end byte is wrong', async () => {
    const frame = sbusFrame([]);
    frame[24] = 0x55;
    const [report] = await run([`sbus 0 ${hex(frame)}`]);
    expect(report.result).toBe(BAD);
  });

  it('drops a short frame cut off by a pause and reads the next whole one', async () => {
    const good = sbusFrame([300]);
    const reports = await run([`sbus 0 ${hex(good.slice(0, 12))}`, `sbus 9000 ${hex(good)}`]);
    expect(reports.map((r) => r.result)).toEqual([BAD, OK]);
    expect(reports[1].channels[0]).toBe(300);
  });

  it('skips noise before the header byte', async () => {
    const reports = await run([`sbus 0 00 ff 13 ${hex(sbusFrame([1500]))}`]);
    expect(reports).toHaveLength(1);
    expect(reports[0]).toMatchObject({ result: OK });
    expect(reports[0].channels[0]).toBe(1500);
  });
});

describe('the iBUS decoder', () => {
  it('reads the published example frame and accepts its checksum', async () => {
    const [report] = await run([`ibus 0 ${hex(IBUS_EXAMPLE)}`]);
    expect(report).toMatchObject({ result: OK, channels: IBUS_EXAMPLE_CHANNELS });
  });

  it('builds the published example frame, checksum included, from its channel values', () => {
    expect(ibusFrame(IBUS_EXAMPLE_CHANNELS)).toEqual(IBUS_EXAMPLE);
  });

  it('rejects a frame whose checksum does not match', async () => {
    const frame = [...IBUS_EXAMPLE];
    frame[30] ^= 0x01;
    const [report] = await run([`ibus 0 ${hex(frame)}`]);
    expect(report.result).toBe(BAD);
  });

  it('rejects a frame with one channel byte changed in transit', async () => {
    const frame = [...IBUS_EXAMPLE];
    frame[4] ^= 0x10;
    const [report] = await run([`ibus 0 ${hex(frame)}`]);
    expect(report.result).toBe(BAD);
  });

  it('drops a short frame cut off by a pause and reads the next whole one', async () => {
    const reports = await run([`ibus 0 ${hex(IBUS_EXAMPLE.slice(0, 20))}`, `ibus 7000 ${hex(IBUS_EXAMPLE)}`]);
    expect(reports.map((r) => r.result)).toEqual([BAD, OK]);
  });
});

// PPM: channel intervals between rising edges, then a sync gap (REFERENCES §5: no formal
// standard; sync longer than about 2.5–3 ms, frame about 20–22.5 ms).
function ppmEdges(start: number, widths: number[], sync = 6000): { edges: number[]; end: number } {
  const edges: number[] = [];
  let t = start;
  for (const w of widths) {
    edges.push(t);
    t += w;
  }
  edges.push(t);
  return { edges, end: t + sync };
}

function ppmTrain(frames: number[][]): string {
  const edges: number[] = [];
  let t = 1000;
  for (const widths of frames) {
    const frame = ppmEdges(t, widths);
    edges.push(...frame.edges);
    t = frame.end;
  }
  edges.push(t);
  return edges.join(' ');
}

describe('the PPM decoder', () => {
  const widths = [1500, 1000, 2000, 1234, 1100, 1900, 1500, 1600];

  it('reads eight channels between sync gaps, once a first sync has been seen', async () => {
    const reports = await run([`ppm 4 ${ppmTrain([widths, widths])}`]);
    expect(reports).toHaveLength(1);
    expect(reports[0]).toMatchObject({ result: OK, channels: widths });
  });

  it('rejects a frame with an interval outside the sane range', async () => {
    const broken = [...widths];
    broken[2] = 400;
    const reports = await run([`ppm 4 ${ppmTrain([widths, broken, widths])}`]);
    expect(reports.map((r) => r.result)).toEqual([BAD, OK]);
  });

  it('rejects a frame with fewer channels than the configuration needs', async () => {
    const reports = await run([`ppm 6 ${ppmTrain([widths, widths.slice(0, 4), widths])}`]);
    expect(reports.map((r) => r.result)).toEqual([BAD, OK]);
  });
});

describe('the RC pulse decoder (one wire per channel)', () => {
  const pulse = (slot: number, at: number, width: number) => [`edge ${slot} 1 ${at}`, `edge ${slot} 0 ${at + width}`];

  it('completes a frame when channel 1 delivers a pulse and every channel is fresh', async () => {
    const reports = await run([
      'rc 3',
      ...pulse(1, 100, 1200),
      ...pulse(2, 2000, 1800),
      ...pulse(0, 5000, 1500),
      'poll 7000',
    ]);
    expect(reports).toEqual([{ kind: 'rc', result: OK, flags: 0, channels: [1500, 1200, 1800] }]);
  });

  it('makes the frame bad when one channel has gone quiet for three frame times', async () => {
    const reports = await run(['rc 2', ...pulse(1, 0, 1200), ...pulse(0, 70_000, 1500), 'poll 72000']);
    expect(reports[0].result).toBe(BAD);
  });

  it('makes the frame bad when a pulse is far too long, as from a floating input', async () => {
    const reports = await run(['rc 2', ...pulse(1, 100, 5000), ...pulse(0, 6000, 1500), 'poll 8000']);
    expect(reports[0].result).toBe(BAD);
  });

  it('reports nothing until channel 1 delivers a new pulse', async () => {
    const reports = await run(['rc 1', 'poll 100', ...pulse(0, 200, 1500), 'poll 2000', 'poll 3000']);
    expect(reports.map((r) => r.result)).toEqual([0, OK, 0]);
  });
});

describe('the link packet', () => {
  const channels = [0, 1023, 512, 100, 900, 0, 1023, 7];

  it('has the catalogued CRC-16/CCITT-FALSE check value for "123456789" (from memory: 0x29B1)', () => {
    expect(crc16CcittFalse(new TextEncoder().encode('123456789'))).toBe(0x29b1);
  });

  it('is packed by the generated C code exactly as the TypeScript description encodes it', async () => {
    const [report] = await run([`pack 4660 513 2 ${channels.join(' ')}`]);
    const expected = encodeLinkPacket({ robotTag: 4660, sequence: 513, retries: 2, channels });
    expect(report.bytes).toBe(Buffer.from(expected).toString('hex'));
  });

  it('is unpacked by the generated C code into the values it was built from', async () => {
    const bytes = encodeLinkPacket({ robotTag: 0x0001, sequence: 65535, retries: 3, channels });
    const [report] = await run([`link 0001 ${hex(bytes)}`]);
    expect(report).toMatchObject({ result: OK, sequence: 65535, retries: 3, channels });
  });

  it('is rejected when a byte changes, the version differs or the robot tag is another robot', async () => {
    const good = encodeLinkPacket({ robotTag: 0x0001, sequence: 1, retries: 0, channels });
    const flipped = Uint8Array.from(good);
    flipped[7] ^= 0x04;
    const otherVersion = encodeLinkPacket({
      robotTag: 0x0001,
      sequence: 1,
      retries: 0,
      channels,
      version: LINK_PACKET_VERSION + 1,
    });
    const reports = await run([
      `link 0001 ${hex(flipped)}`,
      `link 0001 ${hex(otherVersion)}`,
      `link 0002 ${hex(good)}`,
    ]);
    expect(reports.map((r) => r.result)).toEqual([BAD, BAD, BAD]);
  });

  it('is rejected when the payload is short', async () => {
    const good = encodeLinkPacket({ robotTag: 1, sequence: 1, retries: 0, channels });
    const [report] = await run([`link 0001 ${hex(good.slice(0, 20))}`]);
    expect(report.result).toBe(BAD);
  });
});
