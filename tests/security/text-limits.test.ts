import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { renderBundle } from '@server/features/firmware/render-bundle';
import {
  PasswordResetInputSchema,
  PasswordResetRequestSchema,
  SignInInputSchema,
  SignUpInputSchema,
} from '@shared/schemas/auth';
import { BootLineInputSchema } from '@shared/schemas/boot-line';
import { RecordFlashInputSchema } from '@shared/schemas/flash-log';
import { RestoreInputSchema } from '@shared/schemas/history';
import { ImportRevisionFieldsSchema, ImportRobotFieldsSchema } from '@shared/schemas/robot-files';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { CreateRobotInputSchema, RenameRobotInputSchema, SaveRevisionInputSchema } from '@shared/schemas/robots';
import { ChangeRoleInputSchema, CreateTeamInputSchema, InviteMemberInputSchema } from '@shared/schemas/teams';
import { robotConfigInput } from '../factories/robot-config';
import { wiredConfig } from '../factories/wired-config';
import { makeTeamScenario, type TeamScenario } from '../api/support/factories';
import { clientAs, createTestContext, type TestContext } from '../api/support/test-app';

// Every text a person can send has a limit, and names that reach the bundle's README cannot
// smuggle in control characters or turn the text around with direction overrides.

type JsonSchema = Record<string, unknown>;

/** Paths of string values (and record keys) in a JSON Schema that have no length limit. */
function unboundedStrings(node: JsonSchema, path = '$'): string[] {
  const found: string[] = [];
  const types = [node.type].flat();
  if (types.includes('string') && node.maxLength === undefined && !node.enum && node.const === undefined) {
    found.push(path);
  }
  const children: [string, unknown][] = [
    ...Object.entries((node.properties as Record<string, unknown>) ?? {}).map(([k, v]): [string, unknown] => [
      `${path}.${k}`,
      v,
    ]),
    [`${path}[]`, node.items],
    [`${path}{}`, node.additionalProperties],
    [`${path}{key}`, node.propertyNames ?? (node.additionalProperties ? { type: 'string' } : undefined)],
    ...['anyOf', 'oneOf', 'allOf'].flatMap((k) =>
      ((node[k] as unknown[]) ?? []).map((v, i): [string, unknown] => [`${path}<${k}${i}>`, v]),
    ),
  ];
  for (const [childPath, child] of children) {
    if (child && typeof child === 'object') found.push(...unboundedStrings(child as JsonSchema, childPath));
  }
  return found;
}

const REQUEST_SCHEMAS: Record<string, z.ZodType> = {
  RobotConfigSchema,
  SaveRevisionInputSchema,
  CreateRobotInputSchema,
  RenameRobotInputSchema,
  SignUpInputSchema,
  SignInInputSchema,
  PasswordResetRequestSchema,
  PasswordResetInputSchema,
  CreateTeamInputSchema,
  InviteMemberInputSchema,
  ChangeRoleInputSchema,
  RestoreInputSchema,
  RecordFlashInputSchema,
  BootLineInputSchema,
  ImportRobotFieldsSchema,
  ImportRevisionFieldsSchema,
};

describe('text in requests', () => {
  it('has a length limit everywhere, map keys included', () => {
    const unbounded = Object.entries(REQUEST_SCHEMAS).flatMap(([name, schema]) =>
      unboundedStrings(z.toJSONSchema(schema, { io: 'output', unrepresentable: 'any' }) as JsonSchema, name),
    );
    expect(unbounded).toEqual([]);
  });

  it('refuses a map with more entries than a robot could use', () => {
    const config = robotConfigInput();
    const params = Object.fromEntries(Array.from({ length: 1000 }, (_, i) => [`p${i}`, i]));
    const result = RobotConfigSchema.safeParse({ ...config, chassis: { ...config.chassis, params } });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({ path: ['chassis', 'params'], message: 'At most 32 entries' });
  });
});

describe('saving a configuration with an oversized layout parameter', () => {
  let ctx: TestContext;
  let s: TeamScenario;
  beforeAll(async () => {
    ctx = await createTestContext();
    s = await makeTeamScenario(ctx);
  });
  afterAll(() => ctx.close());

  it('is refused with the field named', async () => {
    const config = robotConfigInput();
    const oversized = { ...config, chassis: { ...config.chassis, params: { note: 'x'.repeat(10_000) } } };
    const response = await (
      await clientAs(ctx, s.editor.id)
    )
      .post(`/api/robots/${s.robot.id}/revisions`)
      .send({ baseRevision: 1, message: 'Long note', config: oversized });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toEqual({ 'config.chassis.params.note': 'At most 100 characters' });
  });
});

describe('names in the bundle README', () => {
  it('lose control characters and direction overrides', () => {
    const config = wiredConfig({ name: 'Cart\u202Etrats\u0007\u001b[2J\u2066x\u2069' });
    config.wiring.drivers[0].name = `Front\u200F\u0000 driver`;
    const readme = renderBundle(RobotConfigSchema.parse(config), { revision: 3 }).find((f) => f.path === 'README.md')!;
    expect(readme.content).toContain('Carttrats');
    expect(readme.content).toContain('Front driver');
    expect(readme.content).not.toMatch(
      /[\u0000-\u0008\u000b-\u001f\u007f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/,
    );
  });
});
