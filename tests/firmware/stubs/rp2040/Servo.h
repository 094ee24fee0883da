// Servo library bundled with the Arduino-Pico core (declarations only, for host checks).
#pragma once
#include "Arduino.h"

class Servo {
 public:
  int attach(pin_size_t pin, int minUs, int maxUs);
  void writeMicroseconds(int us);
};
