import type { Controls } from '@shared/schemas/robot-config';

// Register values for the link settings (Nordic nRF24L01+ Product Specification v1.0,
// register map: RF_SETUP bit 5 RF_DR_LOW, bit 3 RF_DR_HIGH, bits 2:1 RF_PWR; SETUP_RETR
// bits 7:4 ARD = (n + 1) × 250 µs, bits 3:0 ARC).
const RF_DR_LOW = 0x20;
const RF_DR_HIGH = 0x08;
const RF_PWR_0DBM = 0x06;

export const RF_SETUP_BY_RATE: Record<Controls['link']['dataRate'], number> = {
  '250k': RF_DR_LOW | RF_PWR_0DBM,
  '1M': RF_PWR_0DBM,
  '2M': RF_DR_HIGH | RF_PWR_0DBM,
};

/** 500 µs between retries: enough at 250 kbps (REFERENCES §6) and at the faster rates. */
export const RETRY_DELAY_CODE = 1;
/** Three retries: at 50 packets a second a fresh packet follows soon anyway. */
export const RETRY_COUNT = 3;

export function nrfRegisterSettings(link: Controls['link']): { rfSetup: number; setupRetr: number } {
  return { rfSetup: RF_SETUP_BY_RATE[link.dataRate], setupRetr: (RETRY_DELAY_CODE << 4) | RETRY_COUNT };
}
