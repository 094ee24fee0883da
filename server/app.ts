import express, { Router, type Express, type RequestHandler } from 'express';
import helmet from 'helmet';
import type { AppConfig, AppContext } from './config';
import type { Db } from './db/client';
import { devMailboxApiRoutes, devMailboxPage } from './features/dev/mailbox.router';
import { activityRoutes } from './features/activity/activity.router';
import { authRoutes } from './features/auth/auth.router';
import { firmwareRoutes } from './features/firmware/firmware.router';
import { bootLineRoutes } from './features/boot-line/boot-line.router';
import { flashLogRoutes } from './features/flash-log/flash-log.router';
import { historyRoutes } from './features/history/history.router';
import { robotFilesRoutes } from './features/robot-files/robot-files.router';
import { photosRoutes } from './features/photos/photos.router';
import { robotBinRoutes } from './features/robot-bin/robot-bin.router';
import { robotsRoutes } from './features/robots/robots.router';
import { invitationsRoutes } from './features/teams/invitations.router';
import { teamsRoutes } from './features/teams/teams.router';
import { createAuth } from './lib/auth';
import { createBackgroundTasks, type BackgroundTasks } from './lib/background-tasks';
import type { Mailbox } from './lib/mail/fake-smtp';
import type { Mailer } from './lib/mail/mailer';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { originCheck } from './middleware/origin-check';
import { loadSession } from './middleware/session';

export interface AppDeps {
  db: Db;
  mailer: Mailer;
  config: AppConfig;
  /** The fake receiver's mailbox; shown at /dev/mailbox outside production. */
  mailbox?: Mailbox;
  /** Serves the web client after the API: the build, or Vite middleware (`npm run dev`). */
  client?: RequestHandler[];
  /** Vite's development client injects inline scripts, which a content security policy forbids. */
  clientHasInlineScripts?: boolean;
  /** Where after-the-answer work runs; tests hand in their own to wait for it. */
  background?: BackgroundTasks;
}

function securityHeaders(config: AppConfig, inlineScripts: boolean): RequestHandler {
  const https = config.appUrl.startsWith('https:');
  return helmet({
    // The built client needs no inline script, so it gets the policy; Vite's development client does.
    contentSecurityPolicy: inlineScripts
      ? false
      : { directives: { upgradeInsecureRequests: https ? [] : null, 'connect-src': ["'self'"] } },
    // Only ask browsers to insist on HTTPS when the app is actually served over it.
    strictTransportSecurity: https,
  });
}

/** Builds the whole app; `server/index.ts` only reads the environment and listens. */
export function createApp(deps: AppDeps): Express {
  const { db, mailer, config } = deps;
  const auth = createAuth(db, { secure: config.nodeEnv === 'production', sessionDays: config.sessionDays });
  const ctx: AppContext = { db, mailer, config, auth, background: deps.background ?? createBackgroundTasks() };
  const showMailbox = deps.mailbox && config.nodeEnv !== 'production';

  const api = Router();
  // Cheap checks first: the origin (headers only) and the session (one indexed read). Each route
  // reads its own body, within its own size limit, after its access checks (`validateBody`).
  api.use(originCheck(config.appUrl));
  api.use(loadSession(auth));
  api.use(authRoutes(ctx));
  api.use(teamsRoutes(ctx));
  api.use(invitationsRoutes(ctx));
  api.use(robotsRoutes(ctx));
  api.use(firmwareRoutes(ctx));
  api.use(historyRoutes(ctx));
  api.use(flashLogRoutes(ctx));
  api.use(bootLineRoutes(ctx));
  api.use(robotFilesRoutes(ctx));
  api.use(photosRoutes(ctx));
  api.use(robotBinRoutes(ctx));
  api.use(activityRoutes(ctx));
  if (showMailbox) api.use(devMailboxApiRoutes(deps.mailbox!));
  api.use(apiNotFound);

  const app = express();
  // Express reads the client address from X-Forwarded-For only through this many proxies.
  app.set('trust proxy', config.trustProxyHops);
  app.use(securityHeaders(config, deps.clientHasInlineScripts ?? false));
  app.use('/api', api);
  if (showMailbox) app.use(devMailboxPage(deps.mailbox!));
  for (const handler of deps.client ?? []) app.use(handler);
  app.use(errorHandler);
  return app;
}
