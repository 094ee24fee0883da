import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { verifyRevision } from '@server/features/firmware/firmware.service';
import { configHash } from '@server/features/firmware/model/config-hash';
import { createCompileQueue } from '@server/features/firmware/verify-queue';
import type { FirmwareFiles, VerifyResult } from '@shared/schemas/firmware';
import { wiredConfig } from '../factories/wired-config';
import { makeTeamScenario } from './support/factories';
import { saveWiredRevision } from './support/firmware-factories';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

/** supertest keeps a zip as bytes only when told how to read it. */
function binaryParser(res: Response, done: (error: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

async function viewerOf(options: Parameters<typeof saveWiredRevision>[2] = {}) {
  const s = await makeTeamScenario(ctx);
  const revision = saveWiredRevision(ctx, s, options);
  return { s, revision, viewer: await clientAs(ctx, s.viewer.id) };
}

describe('the files of a revision', () => {
  it('lists every rendered file with its size and a language for highlighting', async () => {
    const { s, revision, viewer } = await viewerOf();
    const response = await viewer.get(`/api/robots/${s.robot.id}/revisions/2/files`);
    expect(response.status).toBe(200);
    const body = response.body as FirmwareFiles;
    expect(body).toMatchObject({
      revision: 2,
      draft: false,
      sketchFolder: 'greenhouse_cart',
      remoteFolder: null,
      hash: configHash(revision.config),
    });
    const ino = body.files.find((f) => f.path === 'greenhouse_cart/greenhouse_cart.ino')!;
    expect(ino).toMatchObject({ language: 'cpp', size: Buffer.byteLength(ino.content) });
    expect(body.files.find((f) => f.path === 'manifest.json')!.language).toBe('json');
    expect(body.files.find((f) => f.path === 'README.md')!.language).toBe('markdown');
  });

  it('gives the boot line the firmware prints, with the revision and the configuration hash', async () => {
    const { s, revision, viewer } = await viewerOf();
    const body = (await viewer.get(`/api/robots/${s.robot.id}/revisions/2/files`)).body as FirmwareFiles;
    expect(body.bootLine).toBe(
      `boot robot="Greenhouse Cart" revision=2 hash=${configHash(revision.config)} generator=0.1.0 board=uno input=rc-pwm`,
    );
  });

  it("names the remote's sketch folder when the link is home-made", async () => {
    const { s, viewer } = await viewerOf({ board: 'mega2560', input: 'nrf24' });
    const body = (await viewer.get(`/api/robots/${s.robot.id}/revisions/2/files`)).body as FirmwareFiles;
    expect(body.remoteFolder).toBe('greenhouse_cart_remote');
    expect(body.files.map((f) => f.path)).toContain('greenhouse_cart_remote/greenhouse_cart_remote.ino');
  });

  it('answers 422 naming every field that blocks generation', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/revisions/1/files`);
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('firmware_blocked');
    expect(response.body.error.message).toMatch(/^The firmware cannot be generated: .+ has no pin\. \(and \d+ more\)$/);
    expect(response.body.error.fields).toMatchObject({
      'wiring.drivers.0.pins.a.en.pin': 'Bridge A Enable (PWM) has no pin.',
    });
    expect(response.body.error.issues).toContainEqual({
      path: ['wiring', 'drivers', 0, 'pins', 'a.en', 'pin'],
      message: 'Bridge A Enable (PWM) has no pin.',
    });
  });

  it('answers 404 for a revision the robot does not have', async () => {
    const { s, viewer } = await viewerOf();
    expect((await viewer.get(`/api/robots/${s.robot.id}/revisions/3/files`)).status).toBe(404);
  });

  it('refuses a revision that is not a whole number', async () => {
    const { s, viewer } = await viewerOf();
    const response = await viewer.get(`/api/robots/${s.robot.id}/revisions/two/files`);
    expect(response.status).toBe(400);
    expect(response.body.error.fields.revision).toBe('Revision must be a number');
  });
});

describe('the bundle download', () => {
  async function download() {
    const { s, revision, viewer } = await viewerOf();
    const response = await viewer.get(`/api/robots/${s.robot.id}/revisions/2/bundle`).buffer(true).parse(binaryParser);
    return { response, revision, zip: await JSZip.loadAsync(response.body as Buffer) };
  }

  it('is a zip named after the robot and the revision', async () => {
    const { response } = await download();
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/zip');
    expect(response.headers['content-disposition']).toBe('attachment; filename=greenhouse-cart-r2.zip');
  });

  it('holds the sketch folder with the configuration header of this revision', async () => {
    const { zip } = await download();
    expect(zip.file('greenhouse_cart/greenhouse_cart.ino')).not.toBeNull();
    expect(await zip.file('greenhouse_cart/mw_config.h')!.async('string')).toContain('#define MW_REVISION 2UL');
  });

  it("holds config.json equal to the revision's configuration", async () => {
    const { zip, revision } = await download();
    expect(JSON.parse(await zip.file('config.json')!.async('string'))).toEqual(revision.config);
  });

  it('holds manifest.json with the SHA-256 of every other file', async () => {
    const { zip, revision } = await download();
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest).toMatchObject({ revision: 2, configHash: configHash(revision.config), sketch: 'greenhouse_cart' });
    const inZip = Object.values(zip.files).filter((f) => !f.dir && f.name !== 'manifest.json');
    expect(manifest.files.map((f: { path: string }) => f.path).sort()).toEqual(inZip.map((f) => f.name).sort());
    for (const entry of manifest.files as { path: string; sha256: string }[]) {
      expect(entry.sha256, entry.path).toBe(sha256(await zip.file(entry.path)!.async('string')));
    }
  });

  it('answers 422 when the revision cannot become firmware', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/revisions/1/bundle`);
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('firmware_blocked');
  });
});

const requesterOf = (s: { viewer: { id: string }; team: { id: string } }) => ({
  userId: s.viewer.id,
  teamId: s.team.id,
});

describe('the compile check', { timeout: 180_000 }, () => {
  it('reports flash and RAM use of an Uno build against the board limits', async () => {
    const { s, viewer } = await viewerOf();
    const response = await viewer.post(`/api/robots/${s.robot.id}/revisions/2/verify`);
    expect(response.status).toBe(200);
    const [sketch] = (response.body as VerifyResult).sketches;
    expect(sketch).toMatchObject({ folder: 'greenhouse_cart', board: 'uno', ok: true, flashMax: 32256, ramMax: 2048 });
    expect(sketch.flashBytes).toBeGreaterThan(1000);
    expect(sketch.flashBytes).toBeLessThan(sketch.flashMax!);
    expect(sketch.ramBytes).toBeGreaterThan(0);
  });

  it('answers an equal bundle from the cache, with the same content hash', async () => {
    const first = await viewerOf();
    const second = await viewerOf();
    const a = await first.viewer.post(`/api/robots/${first.s.robot.id}/revisions/2/verify`);
    // A full queue would refuse a new compile, so this answer can only come from the cache.
    const cached = await verifyRevision(ctx.appContext, requesterOf(second.s), second.s.robot.id, 2, {
      stepTimeoutMs: 60_000,
      queue: createCompileQueue({ maxPending: 0, perPerson: 0, perTeam: 0 }),
    });
    expect(cached).toEqual(a.body);
  });

  it('says plainly that a board without a compiler here was not checked', async () => {
    const { s, viewer } = await viewerOf({ board: 'esp32-devkitc' });
    const [sketch] = (await viewer.post(`/api/robots/${s.robot.id}/revisions/2/verify`)).body.sketches;
    expect(sketch).toMatchObject({ board: 'esp32-devkitc', ok: null });
    expect(sketch.messages).toMatch(/^No compiler for ESP32\b.* on this server; only AVR boards are compiled here\.$/);
  });

  it('checks the remote transmitter sketch as well as the robot sketch', async () => {
    const { s, viewer } = await viewerOf({ board: 'esp32-devkitc', input: 'nrf24' });
    const sketches = (await viewer.post(`/api/robots/${s.robot.id}/revisions/2/verify`)).body.sketches;
    expect(sketches.map((k: { folder: string; ok: boolean | null }) => [k.folder, k.ok])).toEqual([
      ['greenhouse_cart', null],
      ['greenhouse_cart_remote', true],
    ]);
  });

  it('stops a compile at its time limit, says so, and does not keep that answer', async () => {
    const s = await makeTeamScenario(ctx);
    saveWiredRevision(ctx, s, { name: 'Slow Compile Cart' });
    const limited = await verifyRevision(ctx.appContext, requesterOf(s), s.robot.id, 2, {
      stepTimeoutMs: 1,
      queue: createCompileQueue({ maxPending: 1, perPerson: 1, perTeam: 1 }),
    });
    expect(limited.sketches[0]).toMatchObject({
      ok: false,
      timedOut: true,
      messages: 'The compile step took too long and was stopped.',
    });
    const again = await (await clientAs(ctx, s.viewer.id)).post(`/api/robots/${s.robot.id}/revisions/2/verify`);
    expect(again.body.sketches[0].ok).toBe(true);
  });

  it('answers 503 when the queue of compiles is full', async () => {
    const s = await makeTeamScenario(ctx);
    saveWiredRevision(ctx, s, { name: 'Queued Cart' });
    const full = verifyRevision(ctx.appContext, requesterOf(s), s.robot.id, 2, {
      stepTimeoutMs: 60_000,
      queue: createCompileQueue({ maxPending: 0, perPerson: 1, perTeam: 1 }),
    });
    await expect(full).rejects.toMatchObject({ status: 503, code: 'verify_busy' });
  });

  it('is refused without the Origin header a Mixwright page sends, even for a member', async () => {
    const { s } = await viewerOf();
    const cookie = await ctx.sessionCookie(s.viewer.id);
    const bare = await request(ctx.app).post(`/api/robots/${s.robot.id}/revisions/2/verify`).set('Cookie', cookie);
    expect(bare.status).toBe(403);
    expect(bare.body.error.code).toBe('origin_mismatch');
    const foreign = await request(ctx.app)
      .post(`/api/robots/${s.robot.id}/revisions/2/verify`)
      .set('Cookie', cookie)
      .set('Origin', 'http://elsewhere.example');
    expect(foreign.status).toBe(403);
  });
});

describe('the preview of an unsaved draft', () => {
  it('renders the draft as the revision it becomes when saved next', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const config = wiredConfig({ name: 'Draft Cart' });
    const response = await editor.post(`/api/robots/${s.robot.id}/preview-files`).send({ config });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      revision: 2,
      draft: true,
      sketchFolder: 'draft_cart',
      hash: configHash(config),
    });
    const header = (response.body as FirmwareFiles).files.find((f) => f.path === 'draft_cart/mw_config.h')!;
    expect(header.content).toContain('#define MW_REVISION 2UL');
  });

  it('uses the sketch name the draft sets', async () => {
    const s = await makeTeamScenario(ctx);
    const config = wiredConfig();
    config.firmware.sketchName = 'cart_v2';
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/preview-files`)
      .send({ config });
    expect(response.body.files.map((f: { path: string }) => f.path)).toContain('cart_v2/cart_v2.ino');
  });

  it('refuses an invalid draft, naming the field', async () => {
    const s = await makeTeamScenario(ctx);
    const config = wiredConfig();
    config.chassis.wheels[0].radiusMm = 0;
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/preview-files`)
      .send({ config });
    expect(response.status).toBe(400);
    expect(response.body.error.fields['config.chassis.wheels.0.radiusMm']).toBe('Radius must be more than 0 mm');
  });

  it('answers 422 for a draft whose pins clash', async () => {
    const s = await makeTeamScenario(ctx);
    const config = wiredConfig();
    const [first, second] = Object.keys(config.wiring.drivers[0].pins);
    config.wiring.drivers[0].pins[second] = { ...config.wiring.drivers[0].pins[first] };
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/preview-files`)
      .send({ config });
    expect(response.status).toBe(422);
    expect(Object.keys(response.body.error.fields)).toContain(`wiring.drivers.0.pins.${second}.pin`);
  });
});
