import { describe, expect, it } from 'vitest';
import { heldVector } from '@/features/robot-editor/hooks/use-held-keys';
import { ARENA_KEYS } from '@/features/robot-editor/lib/preview-keys';

const AXES = ['forward', 'strafe', 'yaw'] as const;

describe('held keys', () => {
  it('adds the pushes of every held key', () => {
    expect(heldVector(['w', 'd', 'e'], ARENA_KEYS, AXES, false)).toEqual({ forward: 1, strafe: 1, yaw: 1 });
  });

  it('cancels opposite keys held together', () => {
    expect(heldVector(['w', 's'], ARENA_KEYS, AXES, false).forward).toBe(0);
  });

  it('keeps two keys on one axis within full travel', () => {
    expect(heldVector(['w', 'ArrowUp'], ARENA_KEYS, AXES, false).forward).toBe(1);
  });

  it('halves the push with Shift', () => {
    expect(heldVector(['q'], ARENA_KEYS, AXES, true)).toEqual({ forward: 0, strafe: 0, yaw: -0.5 });
  });
});
