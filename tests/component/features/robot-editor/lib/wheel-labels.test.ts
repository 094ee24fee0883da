import { describe, expect, it } from 'vitest';
import {
  estimateTextWidth,
  LABEL_MAX_WIDTH,
  wheelLabelLines,
  wrapText,
} from '@/features/robot-editor/lib/wheel-labels';
import { makeConfig } from '../../../../factories/engine';

describe('wheel label text', () => {
  it('keeps a short motor name on one line', () => {
    expect(wrapText('Front left', LABEL_MAX_WIDTH, true)).toEqual(['Front left']);
  });

  it('wraps a long motor name at spaces, each line within the label width', () => {
    const lines = wrapText('Front left drive gearmotor 12 V 300 rpm', LABEL_MAX_WIDTH, true);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe('Front left drive gearmotor 12 V 300 rpm');
    for (const line of lines) expect(estimateTextWidth(line, 12, true)).toBeLessThanOrEqual(LABEL_MAX_WIDTH);
  });

  it('cuts a single word too long for any line with an ellipsis', () => {
    const [line, ...rest] = wrapText('Frontleftdrivegearmotorwithencoder');
    expect(rest).toEqual([]);
    expect(line.endsWith('…')).toBe(true);
    expect(estimateTextWidth(line)).toBeLessThanOrEqual(LABEL_MAX_WIDTH);
  });

  it('names the wheel under its motor only when they differ, then the command', () => {
    const [wheel] = makeConfig('differential').chassis.wheels;
    expect(wheelLabelLines(wheel).map((l) => l.text)).toEqual([wheel.motor]);
    expect(wheelLabelLines({ ...wheel, motor: 'M1' }, -0.5).map((l) => l.tone)).toEqual(['motor', 'wheel', 'command']);
  });
});
