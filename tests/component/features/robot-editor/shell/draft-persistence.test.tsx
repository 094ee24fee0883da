import { act, renderHook } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { useRobotDraft } from '@/features/robot-editor/hooks/use-robot-draft';
import { draftKey, readDraft, writeDraft } from '@/features/robot-editor/lib/draft-storage';
import type { RevisionDetail } from '@shared/schemas/robots';
import { robotConfig } from '../../../../factories/robot-config';
import greenhouseCartV1 from '../../../../fixtures/configs/v1/greenhouse-cart.json';

const ROBOT = 'robot-1';

function revision(number: number, overrides: Partial<RevisionDetail['config']> = {}): RevisionDetail {
  return {
    number,
    message: `r${number}`,
    authorName: 'Test',
    createdAt: '2026-03-01T10:00:00.000Z',
    config: robotConfig(overrides),
  };
}

function withFailsafe(config: RevisionDetail['config'], ms: number) {
  return { ...config, safety: { ...config.safety, failsafeTimeoutMs: ms } };
}

let storage: Storage;
beforeEach(() => {
  localStorage.clear();
  storage = localStorage;
});

describe('the robot draft', () => {
  it('starts from the head revision when nothing is stored', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(ROBOT, head, storage));
    expect(result.current).toMatchObject({ baseRevision: 3, dirty: false, behindHead: false });
    expect(result.current.config).toEqual(head.config);
  });

  it('keeps an edit in storage with the revision it started from', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(ROBOT, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    expect(result.current.dirty).toBe(true);
    expect(readDraft(storage, ROBOT)).toMatchObject({
      baseRevision: 3,
      config: { safety: { failsafeTimeoutMs: 150 } },
    });
  });

  it('brings the draft back after a reload', () => {
    const head = revision(3);
    const first = renderHook(() => useRobotDraft(ROBOT, head, storage));
    act(() => first.result.current.setConfig(withFailsafe(head.config, 150)));
    first.unmount();
    const second = renderHook(() => useRobotDraft(ROBOT, head, storage));
    expect(second.result.current).toMatchObject({ dirty: true, baseRevision: 3 });
    expect(second.result.current.config.safety.failsafeTimeoutMs).toBe(150);
  });

  it('forgets the stored draft when the edit is undone by hand', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(ROBOT, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    act(() => result.current.setConfig(withFailsafe(head.config, 250)));
    expect(result.current.dirty).toBe(false);
    expect(storage.getItem(draftKey(ROBOT))).toBeNull();
  });

  it('brings a draft kept in an older schema version forward when it is read', () => {
    localStorage.setItem(
      draftKey(ROBOT),
      JSON.stringify({
        version: 1,
        robotId: ROBOT,
        baseRevision: 2,
        config: greenhouseCartV1,
        updatedAt: '2026-03-01T10:00:00.000Z',
      }),
    );
    const draft = readDraft(storage, ROBOT);
    expect(draft).toMatchObject({ baseRevision: 2, config: { schemaVersion: 2 } });
    expect((draft!.config as { controls: { rateSwitch: object } }).controls.rateSwitch).not.toHaveProperty('positions');
  });

  it('says when the draft started from an older revision than the head', () => {
    writeDraft(storage, { robotId: ROBOT, baseRevision: 2, config: withFailsafe(robotConfig(), 150) });
    const { result } = renderHook(() => useRobotDraft(ROBOT, revision(4), storage));
    expect(result.current).toMatchObject({ baseRevision: 2, behindHead: true, dirty: true, baseConfig: null });
  });

  it('moves onto a saved revision and clears the stored draft', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(ROBOT, head, storage));
    const edited = withFailsafe(head.config, 150);
    act(() => result.current.setConfig(edited));
    act(() => result.current.rebase({ number: 4, config: edited }));
    expect(result.current).toMatchObject({ baseRevision: 4, dirty: false });
    expect(storage.getItem(draftKey(ROBOT))).toBeNull();
  });

  it('throws the draft away on discard', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(ROBOT, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    act(() => result.current.discard());
    expect(result.current.config).toEqual(head.config);
    expect(readDraft(storage, ROBOT)).toBeNull();
  });

  it('ignores a stored draft that belongs to another robot or cannot be read', () => {
    storage.setItem(draftKey(ROBOT), '{not json');
    expect(readDraft(storage, ROBOT)).toBeNull();
    storage.setItem(
      draftKey(ROBOT),
      JSON.stringify({ version: 1, robotId: 'other', baseRevision: 1, config: robotConfig() }),
    );
    expect(readDraft(storage, ROBOT)).toBeNull();
  });

  it('drops a stored draft that is not shaped like a configuration', () => {
    storage.setItem(
      draftKey(ROBOT),
      JSON.stringify({ version: 1, robotId: ROBOT, baseRevision: 1, config: { chassis: {} } }),
    );
    expect(readDraft(storage, ROBOT)).toBeNull();
  });
});
