// Host probe for the generated nRF24L01+ driver: the four hardware hooks talk to a small
// model of the chip's SPI command set and registers (Nordic nRF24L01+ Product Specification
// v1.0: SPI commands, register map, STATUS write-1-to-clear). Commands on stdin:
//   begin <channel> <rf_setup> <setup_retr> <payload> <addr5 hex, LSB first>   absent
//   listen   incoming <hex bytes>   receive <n>   send <hex bytes>   ack <retries>   maxrt   result
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <stdint.h>

static uint8_t regs[32][5];
static uint8_t rxFifo[3][32];
static int rxCount, rxWidth = 32;
static uint8_t txPayload[32];
static int txLength, txFlushes;
static int csnLow, ce, byteIndex, command, absent;
static unsigned long clockUs, ceRiseUs, cePulseUs;

static int width(int reg) { return reg == 0x0A || reg == 0x0B || reg == 0x10 ? 5 : 1; }

static inline void mw_nrf_csn(uint8_t level) {
  csnLow = !level;
  byteIndex = 0;
}
static inline void mw_nrf_ce(uint8_t level) {
  if (level && !ce) ceRiseUs = clockUs;
  if (!level && ce) cePulseUs = clockUs - ceRiseUs;
  ce = level;
}
static inline void mw_nrf_delay_us(uint16_t us) { clockUs += us; }

static uint8_t chip_byte(uint8_t in) {
  int index = byteIndex++;
  if (index == 0) {
    command = in;
    if (command == 0xE1) { txLength = 0; txFlushes++; }
    if (command == 0xE2) rxCount = 0;
    return regs[7][0];
  }
  int arg = index - 1;
  if ((command & 0xE0) == 0x00) return arg < width(command & 0x1F) ? regs[command & 0x1F][arg] : 0;
  if ((command & 0xE0) == 0x20) {
    int reg = command & 0x1F;
    if (reg == 7) regs[7][0] = (uint8_t)(regs[7][0] & ~(in & 0x70));
    else if (arg < width(reg)) regs[reg][arg] = in;
    return 0;
  }
  if (command == 0x61) {
    uint8_t out = rxCount ? rxFifo[0][arg] : 0;
    if (arg == rxWidth - 1 && rxCount) {
      std::memmove(rxFifo[0], rxFifo[1], sizeof rxFifo[0] * 2);
      rxCount--;
    }
    return out;
  }
  if (command == 0xA0 && arg < 32) txPayload[txLength++] = in;
  return 0;
}

static inline uint8_t mw_nrf_spi(uint8_t byte) {
  clockUs += 1;
  if (!csnLow) return 0xFF;
  uint8_t out = chip_byte(byte);
  regs[0x17][0] = (uint8_t)(rxCount ? 0x00 : 0x01) | (uint8_t)(txLength ? 0x00 : 0x10);
  return absent ? 0xFF : out;
}

#include "mw_nrf24.h"

static void parse_hex(char *rest, uint8_t *out, int *n) {
  *n = 0;
  for (char *tok = std::strtok(rest, " \n"); tok; tok = std::strtok(nullptr, " \n")) out[(*n)++] = (uint8_t)std::strtoul(tok, nullptr, 16);
}

static void dump(const char *event, int value) {
  std::printf("{\"event\":\"%s\",\"value\":%d,\"ce\":%d,\"txFlushes\":%d,\"cePulseUs\":%lu,\"regs\":[", event, value, ce, txFlushes, cePulseUs);
  for (int r = 0; r < 0x1E; r++) {
    std::printf("%s[", r ? "," : "");
    for (int i = 0; i < width(r); i++) std::printf("%s%u", i ? "," : "", regs[r][i]);
    std::printf("]");
  }
  std::printf("],\"tx\":[");
  for (int i = 0; i < txLength; i++) std::printf("%s%u", i ? "," : "", txPayload[i]);
  std::printf("]}\n");
}

int main() {
  // Reset values (product specification, register map): CONFIG 0x08, EN_AA 0x3F, SETUP_AW 0x03,
  // SETUP_RETR 0x03, RF_CH 0x02, RF_SETUP 0x0E, STATUS 0x0E, addresses E7E7E7E7E7.
  regs[0][0] = 0x08; regs[1][0] = 0x3F; regs[2][0] = 0x03; regs[3][0] = 0x03; regs[4][0] = 0x03;
  regs[5][0] = 0x02; regs[6][0] = 0x0E; regs[7][0] = 0x0E;
  for (int i = 0; i < 5; i++) regs[0x0A][i] = regs[0x10][i] = 0xE7;
  char line[1024];
  while (std::fgets(line, sizeof line, stdin)) {
    char word[16];
    int used = 0;
    if (std::sscanf(line, "%15s %n", word, &used) < 1) continue;
    char *rest = line + used;
    uint8_t bytes[64];
    int n = 0;
    if (!std::strcmp(word, "absent")) {
      absent = 1;
    } else if (!std::strcmp(word, "begin")) {
      MwNrfSettings s;
      s.channel = (uint8_t)std::strtoul(rest, &rest, 10);
      s.rfSetup = (uint8_t)std::strtoul(rest, &rest, 16);
      s.retries = (uint8_t)std::strtoul(rest, &rest, 16);
      s.payloadBytes = (uint8_t)std::strtoul(rest, &rest, 10);
      parse_hex(rest, bytes, &n);
      for (int i = 0; i < 5; i++) s.address[i] = bytes[i];
      rxWidth = s.payloadBytes;
      dump("begin", mw_nrf_begin(&s));
    } else if (!std::strcmp(word, "listen")) {
      mw_nrf_listen();
      dump("listen", 0);
    } else if (!std::strcmp(word, "incoming")) {
      parse_hex(rest, bytes, &n);
      std::memcpy(rxFifo[rxCount++], bytes, (size_t)n);
      regs[7][0] |= 0x40;
    } else if (!std::strcmp(word, "receive")) {
      uint8_t payload[32] = {0};
      int got = mw_nrf_receive(payload, (uint8_t)rxWidth);
      std::printf("{\"event\":\"receive\",\"value\":%d,\"status\":%u,\"payload\":[", got, regs[7][0]);
      for (int i = 0; got && i < rxWidth; i++) std::printf("%s%u", i ? "," : "", payload[i]);
      std::printf("]}\n");
    } else if (!std::strcmp(word, "transmitter")) {
      mw_nrf_transmitter();
      dump("transmitter", 0);
    } else if (!std::strcmp(word, "send")) {
      parse_hex(rest, bytes, &n);
      mw_nrf_send(bytes, (uint8_t)n);
      dump("send", n);
    } else if (!std::strcmp(word, "ack")) {
      regs[8][0] = (uint8_t)std::strtoul(rest, nullptr, 10);
      regs[7][0] |= 0x20;
      txLength = 0;
    } else if (!std::strcmp(word, "maxrt")) {
      regs[8][0] = 0x0F;
      regs[7][0] |= 0x10;
    } else if (!std::strcmp(word, "result")) {
      uint8_t retries = 0xEE;
      int r = mw_nrf_send_result(&retries);
      std::printf("{\"event\":\"result\",\"value\":%d,\"retries\":%u,\"status\":%u,\"txFlushes\":%d}\n", r, retries, regs[7][0], txFlushes);
    }
    std::fflush(stdout);
  }
  return 0;
}
