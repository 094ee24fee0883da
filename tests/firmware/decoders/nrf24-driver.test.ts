import { beforeAll, describe, expect, it } from 'vitest';
import { nrfRegisterSettings } from '@server/features/firmware/nrf24-settings';
import { addressBytes } from '@server/features/firmware/link-packet';
import { LinkSchema } from '@shared/schemas/robot-config';
import { compileHostProgram, renderDecoderHeaders, runProbe } from '../helpers/host-probe';

// The driver runs on the host against a small model of the chip's SPI interface written from
// the Nordic nRF24L01+ Product Specification v1.0 (tests/firmware/decoders/nrf24-probe.cpp).
// Register addresses: CONFIG 0x00, EN_AA 0x01, EN_RXADDR 0x02, SETUP_AW 0x03, SETUP_RETR 0x04,
// RF_CH 0x05, RF_SETUP 0x06, STATUS 0x07, RX_ADDR_P0 0x0A, TX_ADDR 0x10, RX_PW_P0 0x11.

interface Event {
  event: string;
  value: number;
  ce?: number;
  regs?: number[][];
  tx?: number[];
  payload?: number[];
  retries?: number;
  status?: number;
  txFlushes?: number;
  cePulseUs?: number;
}

let probe: string;
const run = (lines: string[]) => runProbe<Event>(probe, lines);
const hex = (values: number[]) => values.map((v) => v.toString(16)).join(' ');

beforeAll(async () => {
  const dir = await renderDecoderHeaders();
  probe = await compileHostProgram(new URL('./nrf24-probe.cpp', import.meta.url).pathname, dir);
});

describe('link register settings', () => {
  it('selects 250 kbps with RF_DR_LOW set and RF_DR_HIGH clear, at 0 dBm', () => {
    const { rfSetup } = nrfRegisterSettings(LinkSchema.parse({ dataRate: '250k' }));
    expect(rfSetup & 0x20).toBe(0x20);
    expect(rfSetup & 0x08).toBe(0);
    expect(rfSetup & 0x06).toBe(0x06);
  });

  it('gives 2 Mbps the RF_SETUP reset value 0x0E (2 Mbps at 0 dBm)', () => {
    expect(nrfRegisterSettings(LinkSchema.parse({ dataRate: '2M' })).rfSetup).toBe(0x0e);
  });

  it('waits at least 500 µs between retries, as 250 kbps needs (REFERENCES §6)', () => {
    const { setupRetr } = nrfRegisterSettings(LinkSchema.parse({ dataRate: '250k' }));
    expect(((setupRetr >> 4) + 1) * 250).toBeGreaterThanOrEqual(500);
    expect(setupRetr & 0x0f).toBeGreaterThan(0);
  });

  it('writes the address least-significant byte first', () => {
    expect(addressBytes('4D57520001')).toEqual([0x01, 0x00, 0x52, 0x57, 0x4d]);
  });
});

describe('the nRF24L01+ driver', () => {
  const address = addressBytes('4D57520001');
  const begin = `begin 76 26 13 24 ${hex(address)}`;

  it('sets channel, data rate, retries, payload width and address, and finds the chip', async () => {
    const [result] = await run([begin]);
    expect(result.value).toBe(1);
    const regs = result.regs!;
    expect(regs[0x00][0]).toBe(0x0c); // CRC on, two bytes, powered down
    expect(regs[0x01][0]).toBe(0x01);
    expect(regs[0x02][0]).toBe(0x01);
    expect(regs[0x03][0]).toBe(0x03); // five-byte addresses
    expect(regs[0x04][0]).toBe(0x13);
    expect(regs[0x05][0]).toBe(76);
    expect(regs[0x06][0]).toBe(0x26);
    expect(regs[0x11][0]).toBe(24);
    expect(regs[0x0a]).toEqual(address);
    expect(regs[0x10]).toEqual(address);
  });

  it('reports a missing module whose data line reads all ones', async () => {
    const [result] = await run(['absent', begin]);
    expect(result.value).toBe(0);
  });

  it('listens powered up as a receiver with CE high', async () => {
    const [, result] = await run([begin, 'listen']);
    expect(result.regs![0][0]).toBe(0x0f);
    expect(result.ce).toBe(1);
  });

  it('reads a received payload and clears the data-ready flag', async () => {
    const payload = Array.from({ length: 24 }, (_, i) => i * 3);
    const results = await run([begin, 'listen', `incoming ${hex(payload)}`, 'receive', 'receive']);
    expect(results[2]).toMatchObject({ value: 1, payload });
    expect(results[2].status! & 0x40).toBe(0);
    expect(results[3].value).toBe(0);
  });

  it('sends a payload with a CE pulse of at least 10 µs and reports the retries of an acknowledged send', async () => {
    const results = await run([begin, 'transmitter', 'send 1 2 3', 'ack 2', 'result']);
    expect(results[1].regs![0][0]).toBe(0x0e);
    expect(results[2]).toMatchObject({ tx: [1, 2, 3], ce: 0 });
    expect(results[2].cePulseUs).toBeGreaterThanOrEqual(10);
    expect(results[3]).toMatchObject({ value: 1, retries: 2 });
    expect(results[3].status! & 0x30).toBe(0);
  });

  it('flushes the payload when every retry failed', async () => {
    const results = await run([begin, 'transmitter', 'send 9', 'maxrt', 'result']);
    const flushesBefore = results[1].txFlushes!;
    expect(results[3]).toMatchObject({ value: 2, retries: 15 });
    expect(results[3].txFlushes).toBe(flushesBefore + 1);
  });

  it('reports a send still in progress', async () => {
    const results = await run([begin, 'transmitter', 'send 9', 'result']);
    expect(results[3].value).toBe(0);
  });
});
