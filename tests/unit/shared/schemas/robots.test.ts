import { describe, expect, it } from 'vitest';
import { CreateRobotInputSchema, SaveRevisionInputSchema } from '@shared/schemas/robots';
import { robotConfigInput } from '../../../factories/robot-config';

describe('robot request schemas', () => {
  it('accepts a new robot with a full configuration', () => {
    expect(CreateRobotInputSchema.safeParse({ name: 'Rover', config: robotConfigInput() }).success).toBe(true);
  });

  it('asks for a message with every revision', () => {
    const result = SaveRevisionInputSchema.safeParse({ baseRevision: 1, message: '   ', config: robotConfigInput() });
    expect(result.error?.issues).toEqual([expect.objectContaining({ path: ['message'], message: 'Say what changed' })]);
  });

  it('refuses a base revision below 1', () => {
    const result = SaveRevisionInputSchema.safeParse({ baseRevision: 0, message: 'x', config: robotConfigInput() });
    expect(result.error?.issues[0].path).toEqual(['baseRevision']);
  });

  it('reports a configuration problem under the config path', () => {
    const config = robotConfigInput();
    config.chassis.wheels = [];
    const result = SaveRevisionInputSchema.safeParse({ baseRevision: 1, message: 'x', config });
    expect(result.error?.issues.map((i) => i.path.join('.'))).toContain('config.chassis.wheels');
  });
});
