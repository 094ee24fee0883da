// Arduino-Pico (RP2040) core API subset (its documentation: analogWrite settings, Serial
// ports with pin selection and inversion), declarations only, for host compile checks.
#pragma once
#include "../common/arduino-common.h"

#ifndef ARDUINO_ARCH_RP2040
#define ARDUINO_ARCH_RP2040 1
#endif

typedef uint8_t pin_size_t;
#define SERIAL_8N1 0x0
#define SERIAL_8E2 0x1a

void analogWrite(pin_size_t pin, int value);
void analogWriteFreq(uint32_t frequency);
void analogWriteRange(uint32_t range);
void analogReadResolution(int bits);

class SerialUSB : public Stream {
 public:
  void begin(unsigned long baud = 115200);
};

class SerialUART : public Stream {
 public:
  bool setRX(pin_size_t pin);
  bool setTX(pin_size_t pin);
  bool setInvertRX(bool invert = true);
  void begin(unsigned long baud, uint16_t config = SERIAL_8N1);
};

extern SerialUSB Serial;
extern SerialUART Serial1;
extern SerialUART Serial2;
