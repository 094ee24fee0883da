import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listTeamActivity } from '@server/features/activity/activity.repository';
import { robotConfigInput } from '../factories/robot-config';
import { withDeclaredSize, zipOf } from '../factories/zips';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { rowCounts } from './support/row-counts';
import { clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

const v1File = (name: string) => readFileSync(join(__dirname, '../fixtures/configs/v1', name));

async function importRobot(
  s: TeamScenario,
  data: Buffer,
  fileName: string,
  fields: Record<string, string> = {},
  as = s.editor,
) {
  let request = (await clientAs(ctx, as.id)).post(`/api/teams/${s.team.id}/robots/import`);
  for (const [name, value] of Object.entries(fields)) request = request.field(name, value);
  return request.attach('file', data, fileName);
}

/** A bundle zip as the firmware generator lays it out, around the given config.json text. */
function bundle(configJson: string, extra: Record<string, string | Buffer> = {}) {
  return zipOf({
    'test_rover/test_rover.ino': '// sketch\n',
    'test_rover/mw_config.h': '#pragma once\n',
    'README.md': '# Test Rover\n',
    'config.json': configJson,
    'manifest.json': '{}\n',
    ...extra,
  });
}

async function expectRefused(s: TeamScenario, data: Buffer, fileName: string, message: RegExp) {
  const before = rowCounts(ctx);
  const response = await importRobot(s, data, fileName);
  expect(response.status).toBe(400);
  expect(response.body.error.code).toBe('import_rejected');
  expect(response.body.error.message).toMatch(message);
  expect(response.body.error.fields.file).toMatch(message);
  expect(rowCounts(ctx)).toEqual(before);
}

describe('exporting a revision', () => {
  it('downloads the configuration as JSON named after the robot and revision', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${s.robot.id}/revisions/1/export`);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/^application\/json/);
    const slug = s.robot.name.toLowerCase().replace(/[^a-z0-9]+/g, '_');
    expect(response.headers['content-disposition']).toMatch(new RegExp(`^attachment; filename="?${slug}-r1\\.json"?$`));
    expect(JSON.parse(response.text)).toMatchObject({ schemaVersion: 2, name: s.robot.name });
  });
});

describe('importing as a new robot', () => {
  it('round-trips an exported file to an equal configuration', async () => {
    const s = await makeTeamScenario(ctx);
    const viewer = await clientAs(ctx, s.viewer.id);
    const exported = await viewer.get(`/api/robots/${s.robot.id}/revisions/1/export`);
    const imported = await importRobot(s, Buffer.from(exported.text), 'exported.json');
    expect(imported.status).toBe(201);
    expect(imported.body).toMatchObject({
      revision: 1,
      fromVersion: 2,
      notes: [],
      robot: { name: s.robot.name, headRevision: 1 },
    });
    const original = await viewer.get(`/api/robots/${s.robot.id}/revisions/1`);
    const copy = await viewer.get(`/api/robots/${imported.body.robotId}/revisions/1`);
    expect(copy.body.revision.config).toEqual(original.body.revision.config);
    expect(copy.body.revision.message).toBe('Imported from exported.json');
  });

  it('reads config.json from a firmware bundle zip', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await importRobot(s, await bundle(JSON.stringify(robotConfigInput())), 'test_rover-r4.zip', {
      name: 'Bench Copy',
    });
    expect(response.status).toBe(201);
    expect(response.body.notes[0]).toBe('Read config.json from the firmware bundle.');
    expect(response.body.robot.name).toBe('Bench Copy');
  });

  it('reads config.json from a bundle someone zipped again inside a folder', async () => {
    const s = await makeTeamScenario(ctx);
    const zip = await zipOf({
      'download/config.json': JSON.stringify(robotConfigInput()),
      'download/README.md': '#\n',
    });
    expect((await importRobot(s, zip, 'download.zip')).status).toBe(201);
  });

  it('migrates a version 1 file forward and says what changed', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await importRobot(s, v1File('three-positions-no-rates.json'), 'porch-trio.json');
    expect(response.status).toBe(201);
    expect(response.body.fromVersion).toBe(1);
    expect(response.body.notes).toEqual([
      'Converted from schema version 1 to 2.',
      'Rate switch: 3 positions but no rates (so the default two); position 3 uses the last rate (100 %)',
    ]);
    const stored = await (await clientAs(ctx, s.viewer.id)).get(`/api/robots/${response.body.robotId}/revisions/1`);
    expect(stored.body.revision.config.controls.rateSwitch).toEqual({ channel: 6, rates: [0.5, 1, 1] });
  });

  it('records the import in the audit log', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await importRobot(s, v1File('aisle-scout.json'), 'aisle-scout.json');
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'robot.imported',
      target: `robot:${response.body.robotId}`,
      detail: { name: 'Aisle Scout', file: 'aisle-scout.json', fromVersion: 1 },
    });
  });

  it('refuses an invalid configuration with the field path, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const config = robotConfigInput();
    config.chassis.wheels[1].radiusMm = -3;
    const before = rowCounts(ctx);
    const response = await importRobot(s, Buffer.from(JSON.stringify(config)), 'bad.json');
    expect(response.status).toBe(400);
    expect(response.body.error.fields['config.chassis.wheels.1.radiusMm']).toBe('Radius must be more than 0 mm');
    expect(rowCounts(ctx)).toEqual(before);
  });

  it('refuses a file from a newer Mixwright at schemaVersion', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await importRobot(
      s,
      Buffer.from(JSON.stringify({ ...robotConfigInput(), schemaVersion: 9 })),
      'future.json',
    );
    expect(response.body.error.fields['config.schemaVersion']).toMatch(/made by a newer Mixwright/);
  });

  it('refuses a file that is neither JSON nor a zip', async () => {
    const s = await makeTeamScenario(ctx);
    await expectRefused(s, Buffer.from('name: Rover\n'), 'rover.yaml', /^The file is not valid JSON/);
  });

  it('asks for a file when none came', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/teams/${s.team.id}/robots/import`)
      .field('name', 'x');
    expect(response.status).toBe(400);
    expect(response.body.error.fields.file).toBe('Choose a configuration file or bundle zip to upload');
  });

  it('refuses an upload over the size limit with 413', async () => {
    const s = await makeTeamScenario(ctx);
    const response = await importRobot(s, Buffer.alloc(1024 * 1024 + 1, 0x20), 'huge.json');
    expect(response.status).toBe(413);
    expect(response.body.error.fields.file).toBe('The configuration file or bundle zip is larger than 1 MB');
  });

  it('is refused to a viewer, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const before = rowCounts(ctx);
    const response = await importRobot(s, Buffer.from(JSON.stringify(robotConfigInput())), 'x.json', {}, s.viewer);
    expect(response.status).toBe(403);
    expect(rowCounts(ctx)).toEqual(before);
  });
});

describe('zip archives that are refused before anything is read', () => {
  const config = () => JSON.stringify(robotConfigInput());

  it('refuses a path that climbs out with ../', async () => {
    const s = await makeTeamScenario(ctx);
    const zip = await bundle(config(), { '../../etc/cron.d/job': '* * * * * root true\n' });
    await expectRefused(
      s,
      zip,
      'evil.zip',
      /unsafe path: "..\/..\/etc\/cron.d\/job" climbs out of the archive with \.\./,
    );
  });

  it('refuses an absolute path', async () => {
    const s = await makeTeamScenario(ctx);
    await expectRefused(s, await bundle(config(), { '/tmp/x': 'x' }), 'abs.zip', /"\/tmp\/x" is an absolute path/);
  });

  it('refuses backslashes, which some systems read as folders', async () => {
    const s = await makeTeamScenario(ctx);
    await expectRefused(s, await bundle(config(), { '..\\..\\x.txt': 'x' }), 'bs.zip', /uses backslashes/);
  });

  it('refuses a zip that unpacks to too much', async () => {
    const s = await makeTeamScenario(ctx);
    const zip = await bundle(config(), { 'padding.bin': Buffer.alloc(5 * 1024 * 1024) });
    expect(zip.length).toBeLessThan(64 * 1024);
    await expectRefused(s, zip, 'bomb.zip', /The zip unpacks to 5 MB; at most 4 MB are accepted/);
  });

  it('refuses a zip that lies about its size, by counting what it inflates', async () => {
    const s = await makeTeamScenario(ctx);
    const zip = withDeclaredSize(
      await bundle(config(), { 'padding.bin': Buffer.alloc(5 * 1024 * 1024) }),
      'padding.bin',
      10,
    );
    await expectRefused(s, zip, 'liar.zip', /The zip unpacks to more than 4 MB/);
  });

  it('refuses a zip with too many entries', async () => {
    const s = await makeTeamScenario(ctx);
    const many = Object.fromEntries(Array.from({ length: 120 }, (_, i) => [`parts/${i}.txt`, 'x']));
    await expectRefused(
      s,
      await bundle(config(), many),
      'many.zip',
      /The zip holds 125 entries; at most 100 are accepted/,
    );
  });

  it('refuses a zip without config.json', async () => {
    const s = await makeTeamScenario(ctx);
    await expectRefused(s, await zipOf({ 'README.md': '#' }), 'empty.zip', /The zip has no config.json/);
  });

  it('refuses a damaged zip', async () => {
    const s = await makeTeamScenario(ctx);
    const zip = await bundle(config());
    await expectRefused(s, zip.subarray(0, zip.length - 30), 'cut.zip', /not a readable zip archive|damaged/);
  });
});

describe('importing as a new revision', () => {
  it('adds the file as the next revision under this robot’s name', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    const response = await editor
      .post(`/api/robots/${s.robot.id}/revisions/import`)
      .field('baseRevision', '1')
      .field('message', 'From the workshop laptop')
      .attach('file', v1File('greenhouse-cart.json'), 'greenhouse_cart-r7.json');
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ robotId: s.robot.id, revision: 2, fromVersion: 1 });
    expect(response.body.notes).toContain(`The file's robot name “Greenhouse Cart” became “${s.robot.name}”.`);
    const stored = await editor.get(`/api/robots/${s.robot.id}/revisions/2`);
    expect(stored.body.revision).toMatchObject({
      message: 'From the workshop laptop',
      config: { name: s.robot.name, wiring: { board: 'nano' } },
    });
    expect(listTeamActivity(ctx.db, s.team.id, { limit: 1 })[0]).toMatchObject({
      action: 'revision.imported',
      detail: { number: 2, file: 'greenhouse_cart-r7.json' },
    });
  });

  it('answers 409 with the head and the imported draft when the head moved, writing nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const editor = await clientAs(ctx, s.editor.id);
    await editor
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Meanwhile', config: robotConfigInput() });
    const before = rowCounts(ctx);
    const response = await editor
      .post(`/api/robots/${s.robot.id}/revisions/import`)
      .field('baseRevision', '1')
      .attach('file', v1File('greenhouse-cart.json'), 'gc.json');
    expect(response.status).toBe(409);
    expect(response.body.error.head.number).toBe(2);
    expect(response.body.error.draft.config.wiring.board).toBe('nano');
    expect(rowCounts(ctx)).toEqual(before);
  });

  it('is refused to a viewer, and writes nothing', async () => {
    const s = await makeTeamScenario(ctx);
    const before = rowCounts(ctx);
    const response = await (
      await clientAs(ctx, s.viewer.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions/import`)
      .field('baseRevision', '1')
      .attach('file', v1File('greenhouse-cart.json'), 'gc.json');
    expect(response.status).toBe(403);
    expect(rowCounts(ctx)).toEqual(before);
  });
});
