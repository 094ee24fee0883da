// Arduino ESP32 core 3.x API subset (Espressif "Arduino-ESP32" documentation: LEDC API,
// HardwareSerial), declarations only, for host compile checks of generated bundles.
#pragma once
#include "../common/arduino-common.h"

#ifndef ARDUINO_ARCH_ESP32
#define ARDUINO_ARCH_ESP32 1
#endif
#define IRAM_ATTR

#define SERIAL_8N1 0x800001c
#define SERIAL_8E2 0x800003e

// LEDC, core 3.x: channels are chosen by the core; the pin is the handle.
bool ledcAttach(uint8_t pin, uint32_t frequency, uint8_t resolution);
bool ledcWrite(uint8_t pin, uint32_t duty);
void analogReadResolution(uint8_t bits);

class HardwareSerial : public Stream {
 public:
  void begin(unsigned long baud, uint32_t config = SERIAL_8N1, int8_t rxPin = -1, int8_t txPin = -1, bool invert = false,
             unsigned long timeoutMs = 20000UL, uint8_t rxFifoFullThreshold = 120);
};

extern HardwareSerial Serial;
extern HardwareSerial Serial1;
extern HardwareSerial Serial2;
