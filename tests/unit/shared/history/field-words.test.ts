import { describe, expect, it } from 'vitest';
import { fieldName, formatValue, plainWords, quantityWords } from '@shared/history/field-words';

describe('field names', () => {
  it('names a listed field in words', () => {
    expect(fieldName('failsafeTimeoutMs')).toBe('failsafe timeout');
  });

  it('spells out a field that is not listed from its camelCase name', () => {
    expect(fieldName('logicSupply')).toBe('logic supply');
  });

  it('reads the unit of an unlisted field from the ending of its key', () => {
    expect(fieldName('wheelbaseMm')).toBe('wheelbase');
    expect(formatValue('wheelbaseMm', 180)).toBe('180 mm');
  });
});

describe('values in words', () => {
  it('says none for null and not set for a missing value', () => {
    expect(plainWords(null)).toBe('none');
    expect(plainWords(undefined)).toBe('not set');
    expect(formatValue('radiusMm', undefined)).toBe('not set');
  });

  it('writes degrees without a space and other units with one', () => {
    expect(quantityWords(45, '°')).toBe('45°');
    expect(quantityWords(80, '%')).toBe('80 %');
    expect(formatValue('failsafeTimeoutMs', 250)).toBe('250 ms');
  });

  it('says when a number is not a number', () => {
    expect(formatValue('radiusMm', Number.NaN)).toBe('not a number');
  });

  it('gives a fraction of full scale as a percentage', () => {
    expect(formatValue('deadband', 0.05)).toBe('5 %');
  });

  it('says what null means for a field that has a default', () => {
    expect(formatValue('pwmFrequencyHz', null)).toBe('board default');
    expect(formatValue('pin', null)).toBe('unassigned');
  });

  it('puts an object in words with its fields named and formatted', () => {
    expect(plainWords({ radiusMm: 30, reversed: true })).toBe('radius 30 mm, reversed on');
  });
});
