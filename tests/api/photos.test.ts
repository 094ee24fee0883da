import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { gifImage, jpegWithLocation, pngImage, webpImage } from '../factories/images';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { rowCounts } from './support/row-counts';
import { client, clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

const photosDir = () => join(ctx.config.dataDir, 'photos');
const storedFiles = () => (existsSync(photosDir()) ? readdirSync(photosDir()) : []);

async function upload(s: TeamScenario, data: Buffer, fileName: string, as = s.editor) {
  return (await clientAs(ctx, as.id)).put(`/api/robots/${s.robot.id}/photo`).attach('photo', data, fileName);
}

// supertest hands the raw response to a parser; this one keeps the bytes.
const binary = (res: unknown, done: (error: Error | null, body: unknown) => void) => {
  const stream = res as NodeJS.ReadableStream;
  const parts: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => parts.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(parts)));
};

describe('robot photos', () => {
  it('stores a PNG under a random name and gives the robot a photo address', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await upload(s, pngImage(), 'my robot.png');
    expect(response.status).toBe(200);
    expect(response.body.robot.photoUrl).toMatch(new RegExp(`^/api/robots/${s.robot.id}/photo\\?v=\\d+$`));
    expect(storedFiles().some((f) => /^[0-9a-f]{32}\.png$/.test(f))).toBe(true);
    expect(storedFiles()).not.toContain('my robot.png');
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({ action: 'photo.uploaded' });
  });

  it('accepts JPEG and WebP, recognised by their content', async () => {
    const s = await makeTeamScenario(ctx);
    expect((await upload(s, await jpegWithLocation(), 'photo.bin')).status).toBe(200);
    expect((await upload(s, webpImage(), 'photo')).status).toBe(200);
  });

  it('serves the photo to every member with its type', async () => {
    const s = await makeTeamScenario(ctx);
    await upload(s, pngImage(3), 'p.png');
    const response = await (
      await clientAs(ctx, s.viewer.id)
    )
      .get(`/api/robots/${s.robot.id}/photo`)
      .buffer(true)
      .parse(binary as never);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('image/png');
    expect(response.headers['cache-control']).toBe('private, max-age=300');
    expect(await sharp(response.body as Buffer).metadata()).toMatchObject({ format: 'png', width: 3, height: 3 });
  });

  it('answers 404 to someone outside the team, as if there were no robot', async () => {
    const s = await makeTeamScenario(ctx);
    await upload(s, pngImage(), 'p.png');
    const response = await (await clientAs(ctx, s.outsider.id)).get(`/api/robots/${s.robot.id}/photo`);
    expect(response.status).toBe(404);
    expect(response.body.error.message).toBe('Robot not found');
    expect((await client(ctx).get(`/api/robots/${s.robot.id}/photo`)).status).toBe(401);
  });

  it('refuses a GIF by its content, whatever its name, and stores nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const [before, files] = [rowCounts(ctx), storedFiles()];
    const response = await upload(s, gifImage(), 'robot.png');
    expect(response.status).toBe(415);
    expect(response.body.error.fields.photo).toBe(
      'The photo must be a JPEG, PNG or WebP image; this file is a GIF file',
    );
    expect(rowCounts(ctx)).toEqual(before);
    expect(storedFiles()).toEqual(files);
  });

  it('refuses text pretending to be a photo', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await upload(s, Buffer.from('<svg onload="alert(1)"/>'), 'robot.jpg');
    expect(response.status).toBe(415);
    expect(response.body.error.message).toMatch(/this file is not an image this app recognises/);
  });

  it('refuses a photo over 5 MB with 413', async () => {
    const s = await makeTeamScenario(ctx);
    const big = Buffer.concat([pngImage(), Buffer.alloc(5 * 1024 * 1024)]);
    const response = await upload(s, big, 'big.png');
    expect(response.status).toBe(413);
    expect(response.body.error.fields.photo).toBe('The photo is larger than 5 MB');
  });

  it('replaces the old file when a new photo comes', async () => {
    const s = await makeTeamScenario(ctx);
    await upload(s, pngImage(2), 'a.png');
    const countAfterFirst = storedFiles().length;
    await upload(s, pngImage(4), 'b.png');
    expect(storedFiles()).toHaveLength(countAfterFirst);
  });

  it('removes the photo and its file', async () => {
    const s = await makeTeamScenario(ctx);
    await upload(s, pngImage(), 'a.png');
    const count = storedFiles().length;
    const editor = await clientAs(ctx, s.editor.id);
    expect((await editor.delete(`/api/robots/${s.robot.id}/photo`)).status).toBe(204);
    expect(storedFiles()).toHaveLength(count - 1);
    expect((await editor.get(`/api/robots/${s.robot.id}/photo`)).body.error.message).toBe('This robot has no photo');
    expect((await editor.get(`/api/robots/${s.robot.id}`)).body.robot.photoUrl).toBeNull();
  });

  it('is refused to a viewer', async () => {
    const s = await makeTeamScenario(ctx);
    expect((await upload(s, pngImage(), 'a.png', s.viewer)).status).toBe(403);
  });
});
