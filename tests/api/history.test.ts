import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { revisionDiff } from '@server/features/history/history.service';
import { findLiveRobot } from '@server/features/robots/robots.repository';
import { saveRevision } from '@server/features/robots/robots.service';
import type { TextFile } from '@shared/history/file-diff';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { robotConfig, robotConfigInput, sampleConfigInput } from '../factories/robot-config';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { rowCounts } from './support/row-counts';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

/** Saves a revision straight through the service, with a change made to the factory config. */
function save(s: TeamScenario, message: string, change: (c: RobotConfig) => void = () => {}) {
  const config = { ...robotConfig(), name: s.robot.name };
  change(config);
  const head = findLiveRobot(ctx.db, s.robot.id)!.headRevision;
  return saveRevision(ctx.appContext, s.editor, s.robot.id, { baseRevision: head, message, config });
}

describe('two saves on the same base', () => {
  it('keeps the first, answers the second with 409, and loses neither configuration', async () => {
    const s = await makeTeamScenario(ctx);
    const [editor, owner] = await Promise.all([clientAs(ctx, s.editor.id), clientAs(ctx, s.owner.id)]);
    const editorDraft = { ...robotConfigInput(), safety: { failsafeTimeoutMs: 150 } };
    const ownerDraft = { ...robotConfigInput(), safety: { failsafeTimeoutMs: 400 } };
    const answers = await Promise.all([
      editor
        .post(`/api/robots/${s.robot.id}/revisions`)
        .send({ baseRevision: 1, message: 'Editor: quicker failsafe', config: editorDraft }),
      owner
        .post(`/api/robots/${s.robot.id}/revisions`)
        .send({ baseRevision: 1, message: 'Owner: slower failsafe', config: ownerDraft }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
    const winner = answers.find((a) => a.status === 201)!;
    const loser = answers.find((a) => a.status === 409)!;
    const losingTimeout = winner === answers[0] ? 400 : 150;

    const stored = await editor.get(`/api/robots/${s.robot.id}/revisions/2`);
    expect(stored.body.revision.config.safety.failsafeTimeoutMs).toBe(
      winner.body.revision.config.safety.failsafeTimeoutMs,
    );
    expect(loser.body.error).toMatchObject({
      code: 'revision_conflict',
      head: { number: 2, config: { safety: { failsafeTimeoutMs: 550 - losingTimeout } } },
    });
    expect(loser.body.error.draft).toMatchObject({
      baseRevision: 1,
      config: { safety: { failsafeTimeoutMs: losingTimeout } },
    });
    expect(
      (await editor.get(`/api/robots/${s.robot.id}/revisions/1`)).body.revision.config.safety.failsafeTimeoutMs,
    ).toBe(250);
    expect((await editor.get(`/api/robots/${s.robot.id}/revisions`)).body.revisions).toHaveLength(2);
  });

  it('saves the losing draft once it is based on the new head', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    save(s, 'Someone else first');
    const refused = await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Mine', config: robotConfigInput() });
    const { draft, head } = refused.body.error;
    const saved = await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: head.number, message: draft.message, config: draft.config });
    expect(saved.status).toBe(201);
    expect(saved.body.revision).toMatchObject({ number: 3, message: 'Mine' });
  });
});

describe('saving', () => {
  it('accepts a configuration with problems (unassigned pins are warnings, not schema errors)', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Work in progress', config: robotConfigInput() });
    expect(response.status).toBe(201);
    const history = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/history`);
    const problems = history.body.revisions[0].problems;
    expect(problems.errors + problems.warnings).toBeGreaterThan(0);
  });

  it('refuses a schema error with the field path', async () => {
    const s = await makeTeamScenario(ctx);
    const config = {
      ...robotConfigInput(),
      controls: { ...robotConfigInput().controls, rateSwitch: { rates: [2, 1] } },
    };
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Bad', config });
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields)).toEqual(['config.controls.rateSwitch.rates.0']);
  });
});

describe('the history list', () => {
  it('lists every revision newest first with author, message, problem count and flashes', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Longer ramp', (c) => (c.safety.rampPerSecond = 2));
    const owner = await clientAs(ctx, s.owner.id);
    await owner.post(`/api/robots/${s.robot.id}/flashes`).send({ revision: 1, note: 'First upload' });
    const history = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/history`);
    expect(history.status).toBe(200);
    expect(history.body.headRevision).toBe(2);
    expect(history.body.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(history.body.revisions[0]).toMatchObject({
      number: 2,
      message: 'Longer ramp',
      authorName: 'Editor',
      flashes: [],
    });
    expect(history.body.revisions[1].flashes).toEqual([{ flashedAt: expect.any(String), flashedByName: 'Owner' }]);
    expect(history.body.revisions[1].problems).toEqual({ errors: expect.any(Number), warnings: expect.any(Number) });
    expect(history.body.lastFlash).toMatchObject({ revisionNumber: 1, note: 'First upload', flashedByName: 'Owner' });
  });
});

describe('the diff between two revisions', () => {
  it('describes each changed setting in words', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Flip the left wheel', (c) => (c.chassis.wheels[0].reversed = true));
    const diff = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/diff?from=1&to=2`);
    expect(diff.status).toBe(200);
    expect(diff.body.from).toMatchObject({ number: 1 });
    expect(diff.body.to).toMatchObject({ number: 2, message: 'Flip the left wheel' });
    expect(diff.body.settings.map((c: { text: string }) => c.text)).toEqual(['Left wheel: reversed off → on']);
    expect(diff.body.settings[0].path).toEqual(['chassis', 'wheels', 0, 'reversed']);
  });

  it('compares in either direction', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Flip', (c) => (c.chassis.wheels[0].reversed = true));
    const diff = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/diff?from=2&to=1`);
    expect(diff.body.settings[0].text).toBe('Left wheel: reversed on → off');
  });

  it('says why generated files are not compared when there is no generator', () => {
    return makeTeamScenario(ctx).then((s) => {
      expect(revisionDiff(ctx.appContext, s.robot.id, 1, 1, null).files).toEqual({
        available: false,
        reason: expect.stringMatching(/firmware generator/),
      });
    });
  });

  it('compares generated files side by side when a generator is given', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Shorter failsafe', (c) => (c.safety.failsafeTimeoutMs = 200));
    const render = (config: RobotConfig, { revision }: { revision: number }): TextFile[] => [
      {
        path: 'robot/mw_config.h',
        content: `// revision ${revision}\n#define MW_FAILSAFE_MS ${config.safety.failsafeTimeoutMs}\n`,
      },
      { path: 'robot/robot.ino', content: 'void loop() {}\n' },
    ];
    const diff = revisionDiff(ctx.appContext, s.robot.id, 1, 2, render);
    expect(diff.files.available).toBe(true);
    if (!diff.files.available) return;
    expect(diff.files.unchanged).toEqual(['robot/robot.ino']);
    expect(diff.files.changed).toHaveLength(1);
    expect(
      diff.files.changed[0].rows.filter((r) => r.kind === 'changed').map((r) => [r.left?.text, r.right?.text]),
    ).toEqual([
      ['// revision 1', '// revision 2'],
      ['#define MW_FAILSAFE_MS 250', '#define MW_FAILSAFE_MS 200'],
    ]);
  });

  it('compares the firmware the generator makes for each revision', async () => {
    const s = await makeTeamScenario(ctx);
    const owner = await clientAs(ctx, s.owner.id);
    const created = await owner
      .post(`/api/teams/${s.team.id}/robots`)
      .send({ name: 'Garden Hauler', config: sampleConfigInput() });
    const robotId = created.body.robot.id;
    const quicker = { ...sampleConfigInput(), safety: { failsafeTimeoutMs: 150 } };
    await owner
      .post(`/api/robots/${robotId}/revisions`)
      .send({ baseRevision: 1, message: 'Quicker failsafe', config: quicker });
    const diff = await owner.get(`/api/robots/${robotId}/diff?from=1&to=2`);
    expect(diff.body.files.available).toBe(true);
    const paths = diff.body.files.changed.map((f: { path: string }) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['config.json', 'garden_hauler/mw_config.h']));
    expect(diff.body.files.stampOnly).toContain('garden_hauler/mw_mixer.h');
    const header = diff.body.files.changed.find((f: { path: string }) => f.path === 'garden_hauler/mw_config.h');
    const changed = header.rows
      .filter((r: { kind: string }) => r.kind === 'changed')
      .map((r: { right: { text: string } }) => r.right.text);
    expect(changed.some((line: string) => /150/.test(line))).toBe(true);
  });

  it('says which field keeps a revision from being generated', async () => {
    const s = await makeTeamScenario(ctx);
    const diff = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/diff?from=1&to=1`);
    expect(diff.body.files).toEqual({
      available: false,
      reason: expect.stringMatching(/^Revision 1 cannot be generated: [a-zA-Z.0-9]+: /),
    });
  });

  it('names a revision that does not exist', async () => {
    const s = await makeTeamScenario(ctx);
    const diff = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/diff?from=1&to=8`);
    expect(diff.status).toBe(404);
    expect(diff.body.error.message).toBe('Revision 8 not found');
  });

  it('asks for both revisions', async () => {
    const s = await makeTeamScenario(ctx);
    const diff = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/diff?from=1`);
    expect(diff.status).toBe(400);
    expect(diff.body.error.fields.to).toBeDefined();
  });
});

describe('restoring a revision', () => {
  it('makes a new revision with the old configuration and says so in its message', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Slower ramp', (c) => (c.safety.rampPerSecond = 1));
    const editor = await clientAs(ctx, s.editor.id);
    const restored = await editor
      .post(`/api/robots/${s.robot.id}/revisions/1/restore`)
      .send({ baseRevision: 2, note: 'ramp was too soft' });
    expect(restored.status).toBe(201);
    expect(restored.body.revision).toMatchObject({
      number: 3,
      message: 'Restored revision 1: ramp was too soft',
      authorName: 'Editor',
    });
    const [first, third] = await Promise.all([1, 3].map((n) => editor.get(`/api/robots/${s.robot.id}/revisions/${n}`)));
    expect(third.body.revision.config).toEqual(first.body.revision.config);
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'revision.restored',
      detail: { number: 3, from: 1 },
    });
  });

  it('uses the plain message without a note', async () => {
    const s = await makeTeamScenario(ctx);
    const restored = await (
      await clientAs(ctx, s.owner.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/1/restore`)
      .send({ baseRevision: 1 });
    expect(restored.body.revision.message).toBe('Restored revision 1');
  });

  it('answers 409 when the head moved, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    save(s, 'Newer');
    const before = rowCounts(ctx);
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/1/restore`)
      .send({ baseRevision: 1 });
    expect(response.status).toBe(409);
    expect(response.body.error.head.number).toBe(2);
    expect(rowCounts(ctx)).toEqual(before);
  });

  it('is refused to a viewer, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const before = rowCounts(ctx);
    const response = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/1/restore`)
      .send({ baseRevision: 1 });
    expect(response.status).toBe(403);
    expect(rowCounts(ctx)).toEqual(before);
  });

  it('answers 404 for a revision that does not exist', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/5/restore`)
      .send({ baseRevision: 1 });
    expect(response.status).toBe(404);
  });
});
