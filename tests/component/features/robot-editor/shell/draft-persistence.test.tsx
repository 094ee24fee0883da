import { act, renderHook } from '@testing-library/react';
import { beforeEach, describe, expect, it } from 'vitest';
import { useRobotDraft } from '@/features/robot-editor/hooks/use-robot-draft';
import {
  clearDraftsOnSignOut,
  draftKey,
  listUnsavedDrafts,
  readDraft,
  writeDraft,
} from '@/features/robot-editor/lib/draft-storage';
import type { RevisionDetail } from '@shared/schemas/robots';
import { robotConfig } from '../../../../factories/robot-config';
import greenhouseCartV1 from '../../../../fixtures/configs/v1/greenhouse-cart.json';

const OWNER = { userId: 'user-editor', robotId: 'robot-1' };
const SCOPE = { ...OWNER, canEdit: true };

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
    const { result } = renderHook(() => useRobotDraft(SCOPE, head, storage));
    expect(result.current).toMatchObject({ baseRevision: 3, dirty: false, behindHead: false });
    expect(result.current.config).toEqual(head.config);
  });

  it('keeps an edit in storage with the revision it started from', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(SCOPE, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    expect(result.current.dirty).toBe(true);
    expect(readDraft(storage, OWNER)).toMatchObject({
      baseRevision: 3,
      config: { safety: { failsafeTimeoutMs: 150 } },
    });
  });

  it('brings the draft back after a reload', () => {
    const head = revision(3);
    const first = renderHook(() => useRobotDraft(SCOPE, head, storage));
    act(() => first.result.current.setConfig(withFailsafe(head.config, 150)));
    first.unmount();
    const second = renderHook(() => useRobotDraft(SCOPE, head, storage));
    expect(second.result.current).toMatchObject({ dirty: true, baseRevision: 3 });
    expect(second.result.current.config.safety.failsafeTimeoutMs).toBe(150);
  });

  it('forgets the stored draft when the edit is undone by hand', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(SCOPE, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    act(() => result.current.setConfig(withFailsafe(head.config, 250)));
    expect(result.current.dirty).toBe(false);
    expect(storage.getItem(draftKey(OWNER))).toBeNull();
  });

  it('brings a draft kept in an older schema version forward when it is read', () => {
    localStorage.setItem(
      draftKey(OWNER),
      JSON.stringify({
        version: 1,
        ...OWNER,
        baseRevision: 2,
        config: greenhouseCartV1,
        updatedAt: '2026-03-01T10:00:00.000Z',
      }),
    );
    const draft = readDraft(storage, OWNER);
    expect(draft).toMatchObject({ baseRevision: 2, config: { schemaVersion: 2 } });
    expect((draft!.config as { controls: { rateSwitch: object } }).controls.rateSwitch).not.toHaveProperty('positions');
  });

  it('says when the draft started from an older revision than the head', () => {
    writeDraft(storage, { ...OWNER, baseRevision: 2, config: withFailsafe(robotConfig(), 150) });
    const { result } = renderHook(() => useRobotDraft(SCOPE, revision(4), storage));
    expect(result.current).toMatchObject({ baseRevision: 2, behindHead: true, dirty: true, baseConfig: null });
  });

  it('moves onto a saved revision and clears the stored draft', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(SCOPE, head, storage));
    const edited = withFailsafe(head.config, 150);
    act(() => result.current.setConfig(edited));
    act(() => result.current.rebase({ number: 4, config: edited }));
    expect(result.current).toMatchObject({ baseRevision: 4, dirty: false });
    expect(storage.getItem(draftKey(OWNER))).toBeNull();
  });

  it('throws the draft away on discard', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft(SCOPE, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    act(() => result.current.discard());
    expect(result.current.config).toEqual(head.config);
    expect(readDraft(storage, OWNER)).toBeNull();
  });

  it('ignores a stored draft that belongs to another robot or cannot be read', () => {
    storage.setItem(draftKey(OWNER), '{not json');
    expect(readDraft(storage, OWNER)).toBeNull();
    storage.setItem(
      draftKey(OWNER),
      JSON.stringify({ version: 1, ...OWNER, robotId: 'other', baseRevision: 1, config: robotConfig() }),
    );
    expect(readDraft(storage, OWNER)).toBeNull();
  });

  it('drops a stored draft that is not shaped like a configuration', () => {
    storage.setItem(
      draftKey(OWNER),
      JSON.stringify({ version: 1, ...OWNER, baseRevision: 1, config: { chassis: {} } }),
    );
    expect(readDraft(storage, OWNER)).toBeNull();
  });
});

describe('drafts on a shared browser', () => {
  const viewer = { userId: 'user-viewer', robotId: OWNER.robotId };

  it('never shows one person the draft another person left in the same browser', () => {
    const head = revision(3);
    const editor = renderHook(() => useRobotDraft(SCOPE, head, storage));
    act(() => editor.result.current.setConfig(withFailsafe(head.config, 150)));
    editor.unmount();
    const next = renderHook(() =>
      useRobotDraft({ userId: 'user-other-editor', robotId: OWNER.robotId, canEdit: true }, head, storage),
    );
    expect(next.result.current).toMatchObject({ dirty: false, baseRevision: 3 });
    expect(next.result.current.config).toEqual(head.config);
  });

  it('shows someone who cannot edit the head, not a draft stored under their own name', () => {
    const head = revision(3);
    writeDraft(storage, { ...viewer, baseRevision: 3, config: withFailsafe(head.config, 150) });
    const { result } = renderHook(() => useRobotDraft({ ...viewer, canEdit: false }, head, storage));
    expect(result.current.dirty).toBe(false);
    expect(result.current.config).toEqual(head.config);
  });

  it('keeps nothing in the browser for someone who cannot edit', () => {
    const head = revision(3);
    const { result } = renderHook(() => useRobotDraft({ ...viewer, canEdit: false }, head, storage));
    act(() => result.current.setConfig(withFailsafe(head.config, 150)));
    expect(storage.length).toBe(0);
  });

  it('lists the unsaved drafts of the person signing out by robot name', () => {
    writeDraft(storage, { ...OWNER, baseRevision: 3, config: robotConfig({ name: 'Greenhouse Cart' }) });
    writeDraft(storage, { ...viewer, robotId: 'robot-2', baseRevision: 1, config: robotConfig({ name: 'Other' }) });
    expect(listUnsavedDrafts(storage, OWNER.userId)).toEqual([
      expect.objectContaining({ robotId: OWNER.robotId, robotName: 'Greenhouse Cart' }),
    ]);
  });

  it('removes the signed-out person’s drafts and drafts kept without a person, and no one else’s', () => {
    writeDraft(storage, { ...OWNER, baseRevision: 3, config: robotConfig() });
    writeDraft(storage, { ...viewer, robotId: 'robot-2', baseRevision: 1, config: robotConfig() });
    storage.setItem('mixwright:draft:robot-9', JSON.stringify({ version: 1, robotId: 'robot-9' }));
    storage.setItem('unrelated', 'kept');
    clearDraftsOnSignOut(storage, OWNER.userId);
    expect(readDraft(storage, OWNER)).toBeNull();
    expect(storage.getItem('mixwright:draft:robot-9')).toBeNull();
    expect(readDraft(storage, { ...viewer, robotId: 'robot-2' })).not.toBeNull();
    expect(storage.getItem('unrelated')).toBe('kept');
  });
});
