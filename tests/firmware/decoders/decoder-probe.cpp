// Host probe for the generated input decoders: reads one command per line on stdin and
// prints what the decoder reports as one JSON object per line. Compiled by the decoder
// tests with host g++ -Wall -Wextra -Werror against the rendered headers.
//   sbus <time_us> <hex byte>...      feed bytes (all at time_us)
//   ibus <time_us> <hex byte>...
//   ppm <needed> <time_us>...         reset, then feed rising edges
//   rc <count> then: edge <slot> <level> <time_us> / poll <time_us>
//   link <tag> <hex byte>...          unpack one link payload
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include "mw_sbus.h"
#include "mw_ibus.h"
#include "mw_ppm.h"
#include "mw_rc_pulse.h"
#include "mw_link_packet.h"

static void print_channels(const char *kind, int result, const uint16_t *channels, int count, int flags) {
  std::printf("{\"kind\":\"%s\",\"result\":%d,\"flags\":%d,\"channels\":[", kind, result, flags);
  for (int i = 0; i < count; i++) std::printf("%s%u", i ? "," : "", channels[i]);
  std::printf("]}\n");
}

static int read_bytes(char *rest, uint8_t *out, int max) {
  int n = 0;
  for (char *tok = std::strtok(rest, " \n"); tok && n < max; tok = std::strtok(nullptr, " \n")) {
    out[n++] = (uint8_t)std::strtoul(tok, nullptr, 16);
  }
  return n;
}

int main() {
  static MwSbusDecoder sbus;
  static MwIbusDecoder ibus;
  static MwPpmDecoder ppm;
  static MwRcPulseDecoder rc;
  mw_sbus_reset(&sbus);
  mw_ibus_reset(&ibus);
  mw_rc_reset(&rc, 0);
  char line[4096];
  while (std::fgets(line, sizeof line, stdin)) {
    char word[16];
    int used = 0;
    if (std::sscanf(line, "%15s %n", word, &used) < 1) continue;
    char *rest = line + used;
    uint8_t bytes[256];
    if (!std::strcmp(word, "sbus") || !std::strcmp(word, "ibus")) {
      unsigned long t = std::strtoul(rest, &rest, 10);
      int n = read_bytes(rest, bytes, 256);
      bool isSbus = word[0] == 's';
      for (int i = 0; i < n; i++) {
        MwFrameResult r = isSbus ? mw_sbus_feed(&sbus, bytes[i], (uint32_t)t) : mw_ibus_feed(&ibus, bytes[i], (uint32_t)t);
        if (r == MW_FRAME_NONE) continue;
        if (isSbus) print_channels("sbus", r, sbus.channels, 16, sbus.flags);
        else print_channels("ibus", r, ibus.channels, MW_IBUS_CHANNELS, 0);
      }
    } else if (!std::strcmp(word, "ppm")) {
      unsigned long needed = std::strtoul(rest, &rest, 10);
      mw_ppm_reset(&ppm, (uint8_t)needed);
      for (char *tok = std::strtok(rest, " \n"); tok; tok = std::strtok(nullptr, " \n")) {
        MwFrameResult r = mw_ppm_edge(&ppm, (uint32_t)std::strtoul(tok, nullptr, 10));
        if (r != MW_FRAME_NONE) print_channels("ppm", r, ppm.channels, MW_PPM_MAX_CHANNELS, 0);
      }
    } else if (!std::strcmp(word, "rc")) {
      mw_rc_reset(&rc, (uint8_t)std::strtoul(rest, nullptr, 10));
    } else if (!std::strcmp(word, "edge")) {
      unsigned slot, level;
      unsigned long t;
      if (std::sscanf(rest, "%u %u %lu", &slot, &level, &t) == 3) mw_rc_edge(&rc, (uint8_t)slot, (uint8_t)level, (uint32_t)t);
    } else if (!std::strcmp(word, "poll")) {
      uint16_t out[MW_RC_MAX_CHANNELS] = {0};
      MwFrameResult r = mw_rc_poll(&rc, (uint32_t)std::strtoul(rest, nullptr, 10), out);
      print_channels("rc", r, out, rc.count, 0);
    } else if (!std::strcmp(word, "link")) {
      unsigned long tag = std::strtoul(rest, &rest, 16);
      int n = read_bytes(rest, bytes, 256);
      MwLinkPacket packet;
      std::memset(&packet, 0, sizeof packet);
      MwFrameResult r = n == MW_LINK_PACKET_BYTES ? mw_link_unpack(bytes, (uint16_t)tag, &packet) : MW_FRAME_BAD;
      std::printf("{\"kind\":\"link\",\"result\":%d,\"sequence\":%u,\"retries\":%u,\"channels\":[", r, packet.sequence, packet.retries);
      for (int i = 0; i < MW_LINK_CHANNELS; i++) std::printf("%s%u", i ? "," : "", r == MW_FRAME_OK ? packet.channels[i] : 0);
      std::printf("]}\n");
    } else if (!std::strcmp(word, "pack")) {
      // pack <tag> <sequence> <retries> <8 channels>: prints the bytes the remote would send
      MwLinkPacket packet;
      std::memset(&packet, 0, sizeof packet);
      packet.robot_tag = (uint16_t)std::strtoul(rest, &rest, 10);
      packet.sequence = (uint16_t)std::strtoul(rest, &rest, 10);
      packet.retries = (uint8_t)std::strtoul(rest, &rest, 10);
      for (int i = 0; i < MW_LINK_CHANNELS; i++) packet.channels[i] = (uint16_t)std::strtoul(rest, &rest, 10);
      uint8_t out[MW_LINK_PACKET_BYTES];
      mw_link_pack(&packet, out);
      std::printf("{\"kind\":\"pack\",\"bytes\":\"");
      for (int i = 0; i < MW_LINK_PACKET_BYTES; i++) std::printf("%02x", out[i]);
      std::printf("\"}\n");
    }
    std::fflush(stdout);
  }
  return 0;
}
