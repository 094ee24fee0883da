import type { Db } from './db/client';
import type { Env } from './env';
import type { Auth } from './lib/auth';
import type { Mailer } from './lib/mail/mailer';
import { DEFAULT_PASSWORD_COST, type PasswordCost } from './lib/password';

export interface RateLimitSetting {
  windowMs: number;
  limit: number;
}

/** Settings the app is built with; tests make their own (cheaper hashing, tighter limits). */
export interface AppConfig {
  nodeEnv: 'development' | 'test' | 'production';
  /** Where people reach the app; used in e-mailed links and accepted as a request origin. */
  appUrl: string;
  /** Folder for files the app writes besides the database (build outputs, uploads). */
  dataDir: string;
  /**
   * Whether an outgoing mail server (SMTP_URL) delivers e-mail. Without one, mail is only caught
   * locally, so owners are shown each invitation link to pass on by hand.
   */
  outgoingMail: boolean;
  passwordCost: PasswordCost;
  sessionDays: number;
  invitationDays: number;
  passwordResetMinutes: number;
  rateLimits: {
    /** Per address and e-mail: guesses at one account. */
    signIn: RateLimitSetting;
    /** Per address: reset e-mails requested. */
    passwordReset: RateLimitSetting;
    /** Per address: accounts created; also slows probing which e-mails already have one. */
    signUp: RateLimitSetting;
  };
  /** Largest JSON body accepted, in bytes. */
  jsonLimitBytes: number;
  /**
   * Reverse proxies in front of the app. With 0 the client address is the socket's; behind a
   * proxy that would put every visitor under one rate limit, so the proxy's hop count is set.
   */
  trustProxyHops: number;
}

export function configFromEnv(env: Env): AppConfig {
  return {
    nodeEnv: env.NODE_ENV,
    appUrl: env.APP_URL,
    dataDir: env.DATA_DIR,
    outgoingMail: Boolean(env.SMTP_URL),
    passwordCost: DEFAULT_PASSWORD_COST,
    sessionDays: 30,
    invitationDays: 7,
    passwordResetMinutes: 60,
    rateLimits: {
      signIn: { windowMs: 15 * 60_000, limit: 10 },
      passwordReset: { windowMs: 60 * 60_000, limit: 5 },
      // A classroom signing up together shares one address: room for a class, not for a script.
      signUp: { windowMs: 60 * 60_000, limit: 40 },
    },
    jsonLimitBytes: 1024 * 1024,
    trustProxyHops: env.TRUST_PROXY,
  };
}

/** What every service and router is handed. */
export interface AppContext {
  db: Db;
  mailer: Mailer;
  config: AppConfig;
  auth: Auth;
}
