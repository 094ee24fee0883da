import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { listApiRoutes } from '@server/lib/route-list';
import { makeTeamScenario, type TeamScenario } from '../api/support/factories';
import { clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// Garbage in an address or an upload is the sender's mistake: it gets a 400 in the usual
// error shape, and the server's log stays free of stack traces.

let ctx: TestContext;
let s: TeamScenario;
beforeAll(async () => {
  ctx = await createTestContext();
  s = await makeTeamScenario(ctx);
});
afterEach(() => vi.restoreAllMocks());
afterAll(() => ctx.close());

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

describe('a malformed percent-encoding in an address', () => {
  const routesWithParameters = () => listApiRoutes(ctx.app).filter((route) => route.includes('/:'));

  it('is answered with 400 on every route that takes a parameter, without a stack trace', async () => {
    const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
    const routes = routesWithParameters();
    expect(routes.length).toBeGreaterThan(30);
    const owner = await clientAs(ctx, s.owner.id);
    const answers: Record<string, [number, string]> = {};
    for (const route of routes) {
      const [method, path] = route.split(' ');
      const response = await owner[method.toLowerCase() as Method](`${path.replace(/:[A-Za-z]+/g, '%ZZ')}`);
      answers[route] = [response.status, response.body?.error?.code];
    }
    expect(Object.entries(answers).filter(([, answer]) => answer[0] !== 400 || answer[1] !== 'bad_address')).toEqual(
      [],
    );
    expect(logged).not.toHaveBeenCalled();
  });
});

describe('a malformed multipart body', () => {
  const truncated =
    '--edge\r\nContent-Disposition: form-data; name="photo"; filename="a.png"\r\nContent-Type: image/png\r\n\r\nabc';

  it('is answered with 400 on the photo upload', async () => {
    const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .put(`/api/robots/${s.robot.id}/photo`)
      .set('Content-Type', 'multipart/form-data; boundary=edge')
      .send(truncated);
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('bad_upload');
    expect(logged).not.toHaveBeenCalled();
  });

  it('is answered with 400 on the import, also without a boundary', async () => {
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/teams/${s.team.id}/robots/import`)
      .set('Content-Type', 'multipart/form-data')
      .send('not a multipart body');
    expect(response.status).toBe(400);
    expect(response.body.error.message).toMatch(/^The upload could not be read/);
  });
});
