// The Arduino language API shared by every core (Arduino language reference), as declarations
// for host compile checks. Not a core: nothing here runs.
#pragma once
#include <stdint.h>
#include <stddef.h>
#include <string.h>

#define HIGH 0x1
#define LOW 0x0
#define INPUT 0x01
#define OUTPUT 0x03
#define INPUT_PULLUP 0x05
#define RISING 0x01
#define FALLING 0x02
#define CHANGE 0x03
#define MSBFIRST 1
#define PROGMEM

class __FlashStringHelper;
#define F(text) (reinterpret_cast<const __FlashStringHelper *>(text))

void pinMode(uint8_t pin, uint8_t mode);
void digitalWrite(uint8_t pin, uint8_t value);
int digitalRead(uint8_t pin);
int analogRead(uint8_t pin);
void delay(unsigned long ms);
void delayMicroseconds(unsigned int us);
unsigned long millis(void);
unsigned long micros(void);
void attachInterrupt(uint8_t interrupt, void (*handler)(void), int mode);
void noInterrupts(void);
void interrupts(void);
#define digitalPinToInterrupt(p) (p)

class Print {
 public:
  size_t print(const __FlashStringHelper *text);
  size_t print(const char *text);
  size_t print(char c);
  size_t print(int value, int base = 10);
  size_t print(unsigned int value, int base = 10);
  size_t print(long value, int base = 10);
  size_t print(unsigned long value, int base = 10);
  size_t println(const __FlashStringHelper *text);
  size_t println(const char *text);
  size_t println(int value, int base = 10);
  size_t println(unsigned int value, int base = 10);
  size_t println(long value, int base = 10);
  size_t println(unsigned long value, int base = 10);
  size_t println(void);
};

class Stream : public Print {
 public:
  int available(void);
  int read(void);
};
