import { deleteRobot } from '@server/features/robot-bin/robot-bin.service';
import { uploadPhoto } from '@server/features/photos/photos.service';
import { pngImage } from '../../factories/images';
import { robotConfigInput } from '../../factories/robot-config';
import { wiredConfig } from '../../factories/wired-config';
import { uniqueEmail, type TeamScenario } from './factories';
import { saveWiredRevision } from './firmware-factories';
import type { TestContext } from './test-app';

export type Caller = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner';
export const CALLERS: Caller[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner'];

export interface RouteRequest {
  path: string;
  body?: unknown;
  /** A multipart upload instead of a JSON body: the file and any text fields. */
  upload?: { field: string; data: Buffer; fileName: string; fields?: Record<string, string> };
  /** Puts the scenario in the state the route needs (a photo to fetch, a robot in the bin). */
  before?: (ctx: TestContext, s: TeamScenario) => unknown;
}

const exportedConfig = () => Buffer.from(JSON.stringify(robotConfigInput()));

/**
 * Every route that acts on one team's things (`:teamId` or `:robotId`), with the status each
 * kind of caller must get. Non-members get 404 so ids do not leak; members below the needed
 * role get 403. A new route needs a row here, or the coverage test fails.
 */
export const TEAM_ROUTES: Record<
  string,
  { request: (s: TeamScenario) => RouteRequest; expect: Record<Caller, number> }
> = {
  'GET /api/teams/:teamId': {
    request: (s) => ({ path: `/api/teams/${s.team.id}` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/teams/:teamId/members': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/members` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'PATCH /api/teams/:teamId/members/:userId': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/members/${s.spare.id}`, body: { role: 'editor' } }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 },
  },
  'DELETE /api/teams/:teamId/members/:userId': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/members/${s.spare.id}` }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 204 },
  },
  'GET /api/teams/:teamId/activity': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/activity` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/teams/:teamId/invitations': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/invitations` }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 },
  },
  'POST /api/teams/:teamId/invitations': {
    request: (s) => ({
      path: `/api/teams/${s.team.id}/invitations`,
      body: { email: uniqueEmail('new'), role: 'viewer' },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 201 },
  },
  'DELETE /api/teams/:teamId/invitations/:invitationId': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/invitations/${s.invitation.id}` }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 204 },
  },
  'GET /api/teams/:teamId/robots': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/robots` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/teams/:teamId/robots': {
    request: (s) => ({
      path: `/api/teams/${s.team.id}/robots`,
      body: { name: 'Matrix Bot', config: robotConfigInput() },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  'GET /api/robots/:robotId': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'PATCH /api/robots/:robotId': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}`, body: { name: 'Renamed Bot' } }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/revisions': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/revisions` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/revisions/:revision': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/revisions/1` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/revisions': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/revisions`,
      body: { baseRevision: 1, message: 'Matrix change', config: robotConfigInput() },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  // Firmware: viewers may read, download and compile-check; nobody changes anything.
  // The compile check's robot is on an ESP32, so it answers at once ("not checked here").
  'GET /api/robots/:robotId/revisions/:revision/files': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/revisions/2/files`,
      before: (ctx) => saveWiredRevision(ctx, s),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/revisions/:revision/bundle': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/revisions/2/bundle`,
      before: (ctx) => saveWiredRevision(ctx, s),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/revisions/:revision/verify': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/revisions/2/verify`,
      before: (ctx) => saveWiredRevision(ctx, s, { board: 'esp32-devkitc' }),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/preview-files': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/preview-files`, body: { config: wiredConfig() } }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/history': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/history` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/diff': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/diff?from=1&to=1` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/revisions/:revision/restore': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/revisions/1/restore`, body: { baseRevision: 1 } }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  'GET /api/robots/:robotId/flashes': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/flashes` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/flashes': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/flashes`, body: { revision: 1, note: 'Matrix flash' } }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  'POST /api/teams/:teamId/boot-line': {
    request: (s) => ({
      path: `/api/teams/${s.team.id}/boot-line`,
      body: { line: 'boot robot="Matrix" revision=1 hash=00000000' },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/robots/:robotId/boot-line': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/boot-line`,
      body: { line: 'boot robot="Matrix" revision=1 hash=00000000' },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'GET /api/robots/:robotId/revisions/:revision/export': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}/revisions/1/export` }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'POST /api/teams/:teamId/robots/import': {
    request: (s) => ({
      path: `/api/teams/${s.team.id}/robots/import`,
      upload: { field: 'file', data: exportedConfig(), fileName: 'matrix.json' },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  'POST /api/robots/:robotId/revisions/import': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/revisions/import`,
      upload: { field: 'file', data: exportedConfig(), fileName: 'matrix.json', fields: { baseRevision: '1' } },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 },
  },
  'GET /api/robots/:robotId/photo': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/photo`,
      before: (ctx) => uploadPhoto(ctx.appContext, s.owner, s.robot.id, pngImage()),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 200, editor: 200, owner: 200 },
  },
  'PUT /api/robots/:robotId/photo': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/photo`,
      upload: { field: 'photo', data: pngImage(), fileName: 'robot.png' },
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 200, owner: 200 },
  },
  'DELETE /api/robots/:robotId/photo': {
    request: (s) => ({
      path: `/api/robots/${s.robot.id}/photo`,
      before: (ctx) => uploadPhoto(ctx.appContext, s.owner, s.robot.id, pngImage()),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 204, owner: 204 },
  },
  'DELETE /api/robots/:robotId': {
    request: (s) => ({ path: `/api/robots/${s.robot.id}` }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 204 },
  },
  'GET /api/teams/:teamId/robot-bin': {
    request: (s) => ({ path: `/api/teams/${s.team.id}/robot-bin` }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 },
  },
  'POST /api/teams/:teamId/robot-bin/:robotId/restore': {
    request: (s) => ({
      path: `/api/teams/${s.team.id}/robot-bin/${s.robot.id}/restore`,
      before: (ctx) => deleteRobot(ctx.appContext, s.owner, s.robot.id),
    }),
    expect: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 },
  },
};

/**
 * Routes outside any team: who may call them. `anonymous` is the status without a session,
 * `signedIn` with one (of someone in no team).
 */
export const OTHER_ROUTES: Record<
  string,
  { request: (s: TeamScenario) => RouteRequest; anonymous: number; signedIn: number }
> = {
  'POST /api/auth/sign-up': {
    request: () => ({
      path: '/api/auth/sign-up',
      body: { name: 'New Person', email: uniqueEmail('signup'), password: 'a long enough password' },
    }),
    anonymous: 201,
    signedIn: 201,
  },
  'POST /api/auth/sign-in': {
    request: (s) => ({ path: '/api/auth/sign-in', body: { email: s.viewer.email, password: s.viewer.password } }),
    anonymous: 200,
    signedIn: 200,
  },
  'POST /api/auth/sign-out': { request: () => ({ path: '/api/auth/sign-out' }), anonymous: 401, signedIn: 204 },
  'GET /api/auth/me': { request: () => ({ path: '/api/auth/me' }), anonymous: 401, signedIn: 200 },
  'POST /api/auth/password-reset': {
    request: (s) => ({ path: '/api/auth/password-reset', body: { email: s.viewer.email } }),
    anonymous: 202,
    signedIn: 202,
  },
  'POST /api/auth/password-reset/confirm': {
    request: () => ({
      path: '/api/auth/password-reset/confirm',
      body: { token: 'x'.repeat(43), password: 'a long enough password' },
    }),
    anonymous: 400,
    signedIn: 400,
  },
  'GET /api/teams': { request: () => ({ path: '/api/teams' }), anonymous: 401, signedIn: 200 },
  'POST /api/teams': {
    request: () => ({ path: '/api/teams', body: { name: 'Another team' } }),
    anonymous: 401,
    signedIn: 201,
  },
  'GET /api/invitations/:token': {
    request: (s) => ({ path: `/api/invitations/${s.invitation.token}` }),
    anonymous: 200,
    signedIn: 200,
  },
  'POST /api/invitations/:token/accept': {
    // The outsider is not the invited address, so a signed-in caller is refused by e-mail.
    request: (s) => ({ path: `/api/invitations/${s.invitation.token}/accept` }),
    anonymous: 401,
    signedIn: 403,
  },
  'GET /api/dev/mailbox': { request: () => ({ path: '/api/dev/mailbox' }), anonymous: 200, signedIn: 200 },
};
