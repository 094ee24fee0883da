import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listApiRoutes } from '@server/lib/route-list';
import { makeTeamScenario, type TeamScenario } from './support/factories';
import { CALLERS, OTHER_ROUTES, TEAM_ROUTES, type Caller, type RouteRequest } from './support/route-matrix';
import { client, clientAs, createTestContext, type TestContext } from './support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

async function send(route: string, req: RouteRequest, userId: string | null): Promise<number> {
  const method = route.split(' ')[0].toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const agent = userId ? await clientAs(ctx, userId) : client(ctx);
  if (req.upload) {
    const { field, data, fileName, fields = {} } = req.upload;
    let upload = agent[method](req.path);
    for (const [name, value] of Object.entries(fields)) upload = upload.field(name, value);
    return (await upload.attach(field, data, fileName)).status;
  }
  const response = await (req.body === undefined
    ? agent[method](req.path)
    : agent[method](req.path).send(req.body as object));
  return response.status;
}

function callerId(s: TeamScenario, caller: Caller): string | null {
  return caller === 'anonymous' ? null : s[caller].id;
}

describe('the role matrix', () => {
  it('has a row for every API route, and no row for a route that does not exist', () => {
    const registered = listApiRoutes(ctx.app);
    const listed = [...Object.keys(TEAM_ROUTES), ...Object.keys(OTHER_ROUTES)].sort();
    expect(listed).toEqual(registered);
  });

  it('lists every route with a team or robot id among the team routes', () => {
    const scoped = listApiRoutes(ctx.app).filter((r) => /:(teamId|robotId)\b/.test(r));
    expect(scoped.sort()).toEqual(Object.keys(TEAM_ROUTES).sort());
  });

  for (const [route, row] of Object.entries(TEAM_ROUTES)) {
    describe(route, () => {
      for (const caller of CALLERS) {
        it(`answers ${row.expect[caller]} to ${caller === 'outsider' ? 'a signed-in non-member' : `the ${caller}`}`, async () => {
          const scenario = await makeTeamScenario(ctx);
          const req = row.request(scenario);
          await req.before?.(ctx, scenario);
          expect(await send(route, req, callerId(scenario, caller))).toBe(row.expect[caller]);
        });
      }
    });
  }

  for (const [route, row] of Object.entries(OTHER_ROUTES)) {
    describe(route, () => {
      it(`answers ${row.anonymous} without a session`, async () => {
        const scenario = await makeTeamScenario(ctx);
        expect(await send(route, row.request(scenario), null)).toBe(row.anonymous);
      });
      it(`answers ${row.signedIn} to someone signed in`, async () => {
        const scenario = await makeTeamScenario(ctx);
        expect(await send(route, row.request(scenario), scenario.outsider.id)).toBe(row.signedIn);
      });
    });
  }
});
