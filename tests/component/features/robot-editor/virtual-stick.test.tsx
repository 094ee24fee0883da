import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { CENTRE, VirtualStick, type StickValue } from '@/features/robot-editor/components/virtual-stick';
import { LEFT_STICK_KEYS, RIGHT_STICK_KEYS } from '@/features/robot-editor/lib/preview-keys';

function Stick({ axes = 'xy' as const, seen }: { axes?: 'xy' | 'x'; seen: StickValue[] }) {
  const [value, setValue] = useState<StickValue>(CENTRE);
  return (
    <VirtualStick
      label="Right stick"
      axes={axes}
      value={value}
      onChange={(v) => {
        seen.push(v);
        setValue(v);
      }}
      keyMap={axes === 'x' ? LEFT_STICK_KEYS : RIGHT_STICK_KEYS}
      keyHelp="help"
      valueText={(v) => `x ${v.x}, y ${v.y}`}
    />
  );
}

describe('an on-screen stick', () => {
  it('is a focusable, labelled control with its key help as description', () => {
    render(<Stick seen={[]} />);
    const stick = screen.getByRole('slider', { name: 'Right stick' });
    expect(stick.tabIndex).toBe(0);
    expect(stick.getAttribute('aria-valuenow')).toBe('0');
    expect(screen.getByText('help').id).toBe(stick.getAttribute('aria-describedby'));
  });

  it('goes fully forward while the up arrow is held and springs back on release', () => {
    const seen: StickValue[] = [];
    render(<Stick seen={seen} />);
    const stick = screen.getByRole('slider');
    stick.focus();
    fireEvent.keyDown(stick, { key: 'ArrowUp' });
    expect(seen.at(-1)).toEqual({ x: 0, y: 1 });
    expect(stick.getAttribute('aria-valuenow')).toBe('100');
    fireEvent.keyUp(stick, { key: 'ArrowUp' });
    expect(seen.at(-1)).toEqual(CENTRE);
    expect(stick.getAttribute('aria-valuenow')).toBe('0');
  });

  it('combines two held keys into a diagonal and halves it with Shift', () => {
    const seen: StickValue[] = [];
    render(<Stick seen={seen} />);
    const stick = screen.getByRole('slider');
    fireEvent.keyDown(stick, { key: 'w' });
    fireEvent.keyDown(stick, { key: 'D', shiftKey: true });
    expect(seen.at(-1)).toEqual({ x: 0.5, y: 0.5 });
  });

  it('centres when it loses focus with a key still held', () => {
    const seen: StickValue[] = [];
    render(<Stick seen={seen} />);
    const stick = screen.getByRole('slider');
    fireEvent.keyDown(stick, { key: 'ArrowLeft' });
    expect(seen.at(-1)).toEqual({ x: -1, y: 0 });
    fireEvent.blur(stick);
    expect(seen.at(-1)).toEqual(CENTRE);
  });

  it('keeps a sideways-only stick at centre vertically', () => {
    const seen: StickValue[] = [];
    render(<Stick axes="x" seen={seen} />);
    const stick = screen.getByRole('slider');
    fireEvent.keyDown(stick, { key: 'e' });
    fireEvent.keyDown(stick, { key: 'ArrowUp' });
    expect(seen.at(-1)).toEqual({ x: 1, y: 0 });
  });
});

describe('dragging an on-screen stick', () => {
  it('follows the pointer within its square travel and springs back when let go', () => {
    const seen: StickValue[] = [];
    render(<Stick seen={seen} />);
    const stick = screen.getByRole('slider');
    // A 148 px stick at the page's origin: centre (74, 74), knob travel 74 − 0.13·148 − 6 = 48.76 px.
    stick.getBoundingClientRect = () => ({
      left: 0,
      top: 0,
      width: 148,
      height: 148,
      right: 148,
      bottom: 148,
      x: 0,
      y: 0,
      toJSON: () => ({}),
    });
    const travel = 74 - 0.13 * 148 - 6;
    fireEvent.pointerDown(stick, { clientX: 74 + travel / 2, clientY: 74, pointerId: 1 });
    expect(seen.at(-1)!.x).toBeCloseTo(0.5, 9);
    expect(seen.at(-1)!.y).toBeCloseTo(0, 9);
    fireEvent.pointerMove(stick, { clientX: 74, clientY: 0, pointerId: 1 });
    expect(seen.at(-1)).toEqual({ x: 0, y: 1 });
    fireEvent.pointerUp(stick, { pointerId: 1 });
    expect(seen.at(-1)).toEqual(CENTRE);
  });
});
