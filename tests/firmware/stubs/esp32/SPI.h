// SPI library API (Arduino SPI reference), declarations only, for host compile checks.
#pragma once
#include "Arduino.h"

#define SPI_MODE0 0x00

class SPISettings {
 public:
  SPISettings(uint32_t clock, uint8_t bitOrder, uint8_t dataMode);
};

class SPIClass {
 public:
  void begin(void);
  void beginTransaction(SPISettings settings);
  uint8_t transfer(uint8_t data);
};

extern SPIClass SPI;
