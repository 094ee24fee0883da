import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { defaultVerifySettings } from '@server/features/firmware/firmware.service';
import { makeTeamScenario, type TeamScenario } from '../api/support/factories';
import { saveWiredRevision } from '../api/support/firmware-factories';
import { clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// A compile check takes a core for seconds. One viewer asking for a dozen of them must not
// take every place in the queue from the rest of the team and the other teams.

let ctx: TestContext;
let s: TeamScenario;
let release: () => void = () => {};

beforeAll(async () => {
  ctx = await createTestContext();
  s = await makeTeamScenario(ctx);
  // An ESP32 bundle: no compiler for it here, so an admitted check finishes at once.
  saveWiredRevision(ctx, s, { board: 'esp32-devkitc' });
});
afterEach(() => release());
afterAll(() => ctx.close());

/** Holds places in the server's compile queue for a person until the test ends. */
function holdPlaces(person: string, team: string, count: number): void {
  const held = new Promise<void>((resolve) => (release = resolve));
  for (let i = 0; i < count; i += 1) {
    void defaultVerifySettings.queue.run({ key: `held-${person}-${i}`, person, team, job: () => held });
  }
}

const verify = async (userId: string) =>
  (await clientAs(ctx, userId)).post(`/api/robots/${s.robot.id}/revisions/2/verify`);

describe('the compile-check queue', () => {
  it('refuses a person more checks than their share, with a reason', async () => {
    holdPlaces(s.viewer.id, s.team.id, 2);
    const response = await verify(s.viewer.id);
    expect(response.status).toBe(429);
    expect(response.body.error.code).toBe('verify_share_used');
  });

  it('still admits someone else from the same team while one person has used their share', async () => {
    holdPlaces(s.viewer.id, s.team.id, 2);
    const answer = verify(s.editor.id);
    // The editor's check is admitted behind the viewer's two before they are let go.
    while (defaultVerifySettings.queue.pending < 3) await new Promise((resolve) => setTimeout(resolve, 5));
    release();
    const response = await answer;
    expect(response.status).toBe(200);
    expect(response.body.sketches[0]).toMatchObject({ board: 'esp32-devkitc', ok: null });
  });
});
