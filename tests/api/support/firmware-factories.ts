import { saveRevision } from '@server/features/robots/robots.service';
import type { StarterOptions } from '@shared/starter';
import { wiredConfig } from '../../factories/wired-config';
import type { TeamScenario } from './factories';
import type { TestContext } from './test-app';

/**
 * Saves revision 2 of the scenario's robot with every pin placed, so its firmware can be
 * generated (revision 1 of the scenario robot has no pins and is refused).
 */
export function saveWiredRevision(ctx: TestContext, s: TeamScenario, options: Partial<StarterOptions> = {}) {
  const config = wiredConfig(options);
  return saveRevision(ctx.appContext, s.owner, s.robot.id, { baseRevision: 1, message: 'Pins placed', config });
}
