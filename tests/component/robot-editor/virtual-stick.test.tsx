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
