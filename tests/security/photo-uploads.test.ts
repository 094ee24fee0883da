import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jpegWithLocation, pngDeclaring, pngImage } from '../factories/images';
import { makeTeamScenario, type TeamScenario } from '../api/support/factories';
import { rowCounts } from '../api/support/row-counts';
import { clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// Club photos show children and where they meet. What is kept must be the picture and nothing
// else, and a small file must not be able to make the server decode billions of pixels.

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

async function upload(s: TeamScenario, data: Buffer, fileName: string) {
  return (await clientAs(ctx, s.editor.id)).put(`/api/robots/${s.robot.id}/photo`).attach('photo', data, fileName);
}

/** The stored file of the robot's photo. */
function storedPhoto(robotId: string): Buffer {
  const row = ctx.database.sqlite.prepare('select file_name from robot_photos where robot_id = ?').get(robotId) as {
    file_name: string;
  };
  return readFileSync(join(ctx.config.dataDir, 'photos', row.file_name));
}

describe('uploaded photos', () => {
  it('lose their EXIF data, GPS position included', async () => {
    const s = await makeTeamScenario(ctx);
    const original = await jpegWithLocation();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    expect((await upload(s, original, 'club-day.jpg')).status).toBe(200);
    const stored = storedPhoto(s.robot.id);
    const metadata = await sharp(stored).metadata();
    expect(metadata).toMatchObject({ format: 'jpeg', width: 64, height: 48 });
    expect(metadata.exif).toBeUndefined();
    expect(stored.includes(Buffer.from('Larkspur Camera'))).toBe(false);
  });

  it('lose anything appended after the image', async () => {
    const s = await makeTeamScenario(ctx);
    const trailer = Buffer.from('<html><script>alert(document.cookie)</script></html>');
    expect((await upload(s, Buffer.concat([pngImage(8), trailer]), 'robot.png')).status).toBe(200);
    const stored = storedPhoto(s.robot.id);
    expect(stored.includes(Buffer.from('<script'))).toBe(false);
    expect(await sharp(stored).metadata()).toMatchObject({ format: 'png', width: 8, height: 8 });
  });

  it('are refused by the size their header declares, before any pixel is decoded', async () => {
    const s = await makeTeamScenario(ctx);
    const before = rowCounts(ctx);
    const response = await upload(s, pngDeclaring(65535, 65535), 'huge.png');
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('photo_too_many_pixels');
    expect(response.body.error.fields.photo).toMatch(/65535 × 65535 pixels/);
    expect(rowCounts(ctx)).toEqual(before);
  });

  it('are kept at most 2048 pixels on their longest side', async () => {
    const s = await makeTeamScenario(ctx);
    const wide = await sharp({ create: { width: 3000, height: 1000, channels: 3, background: '#2a6f73' } })
      .png()
      .toBuffer();
    expect((await upload(s, wide, 'panorama.png')).status).toBe(200);
    expect(await sharp(storedPhoto(s.robot.id)).metadata()).toMatchObject({ width: 2048, height: 683 });
  });

  it('are stored only as re-encoded, never as uploaded', async () => {
    const s = await makeTeamScenario(ctx);
    const original = await jpegWithLocation();
    await upload(s, original, 'club-day.jpg');
    const files = readdirSync(join(ctx.config.dataDir, 'photos')).map((f) =>
      readFileSync(join(ctx.config.dataDir, 'photos', f)),
    );
    expect(files.some((file) => file.equals(original))).toBe(false);
  });
});
