import * as z from 'zod';
import { formatIssues } from '../shared/model/validation-messages';

const flag = z.enum(['true', 'false'], 'must be "true" or "false"').transform((v) => v === 'true');
const whole = (min: number, max: number) =>
  z
    .string()
    .regex(/^\d+$/, 'must be a whole number')
    .transform(Number)
    .refine((n) => n >= min && n <= max, `must be between ${min} and ${max}`);
const url = (protocols: string[]) =>
  z
    .string()
    .refine((v) => URL.canParse(v) && protocols.includes(new URL(v).protocol), `must be a URL starting with ${protocols.join(' or ')}//`);

/** The environment the server reads; every variable is optional but SESSION_SECRET in production. */
const environment = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test'], 'must be development, production or test').default('development'),
    PORT: whole(1, 65_535).default(3000),
    /** Loopback by default: a shop server is opened to the network on purpose, not by accident. */
    HOST: z.string().min(1).default('127.0.0.1'),
    DATABASE_URL: url(['postgres:', 'postgresql:']).optional(),
    DATA_DIR: z.string().min(1).default('./data'),
    SESSION_SECRET: z.string().min(32, 'must be at least 32 characters long').optional(),
    /** A real mail server; without it, mail goes to the local catcher an admin reads on the Outbox page. */
    SMTP_URL: url(['smtp:', 'smtps:']).optional(),
    /** The address the shop opens Borewright at; the links in invitation and reset mails start with it. */
    PUBLIC_URL: url(['http:', 'https:']).optional(),
    /** The address mail is sent from; a real mail server may insist on one of its own domain. */
    MAIL_FROM: z.string().trim().email('must be an e-mail address').default('borewright@localhost'),
    ALLOW_DEMO_IN_PRODUCTION: flag.default(false),
    /** Express's "trust proxy": set it when a TLS proxy sits in front, so Secure cookies and client addresses work. */
    TRUST_PROXY: z.string().min(1).optional(),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
    SESSION_IDLE_MINUTES: whole(1, 7 * 24 * 60).default(8 * 60),
    SESSION_MAX_DAYS: whole(1, 365).default(7),
    /** How long an invitation link works: long enough for someone back from a week away. */
    INVITATION_DAYS: whole(1, 90).default(7),
    /** How long a password reset link works: short, as whoever reads the mail can take the account. */
    PASSWORD_RESET_MINUTES: whole(5, 24 * 60).default(60),
    /** "open": visitors may create a shop of their own (server/signup/); "closed": one installation, one shop. */
    SIGNUP: z.enum(['open', 'closed'], 'must be "open" or "closed"').default('closed'),
    /** How long the link confirming a new shop's address works. */
    SIGNUP_LINK_HOURS: whole(1, 7 * 24).default(24),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && !env.SESSION_SECRET) {
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'is required when NODE_ENV=production' });
    }
  });

export type Config = {
  env: 'development' | 'production' | 'test';
  port: number;
  host: string;
  databaseUrl?: string;
  dataDir: string;
  /** Absent in development: server/auth/session-secret.ts makes one and keeps it in the data folder. */
  sessionSecret?: string;
  smtpUrl?: string;
  mailFrom: string;
  /** PUBLIC_URL without a trailing slash: where the links in mail point (http/request-origin.ts). */
  publicUrl?: string;
  /** A pack up to this size goes attached; a larger one as a link that expires. */
  packAttachLimitBytes: number;
  /** The largest photo or PDF a job attachment may be. */
  attachmentLimitBytes: number;
  /** Whether visitors may create shops (SIGNUP=open); closed, the sign-up routes answer 404. */
  signUpOpen: boolean;
  /** Demo accounts are created and may sign in: always outside production, in production only when allowed. */
  demoAccounts: boolean;
  /** Cookies only over HTTPS: in production (behind TLS, with TRUST_PROXY set when a proxy ends it). */
  secureCookies: boolean;
  trustProxy?: string;
  logLevel: string;
  session: { idleMs: number; absoluteMs: number };
  /** Sign-in throttling per client address and per address and account (auth/sign-in-throttle.ts). */
  signInThrottle: {
    windowMs: number;
    perAddress: { free: number; refuseAfter: number };
    perPair: { free: number; refuseAfter: number };
    baseDelayMs: number;
    /** The longest the right password waits at its owner's usual address. */
    maxDelayMs: number;
    usualAddressDays: number;
  };
  /** How long the single-use links sent by mail work (server/team/mail-tokens.ts). */
  mailLinks: { invitationMs: number; passwordResetMs: number; signUpMs: number };
  /** Reset mails asked for, per address asked about and per client address: no one fills a mailbox with them. */
  passwordResetLimits: MailRequestLimits;
  /** Sign-up mails asked for, counted the same way. */
  signUpLimits: MailRequestLimits;
};

/** Requests that send mail to an address typed by whoever asks, counted in the database (auth/mail-request-limits.ts). */
export interface MailRequestLimits {
  windowMs: number;
  /** Per address asked about. */
  perAccount: number;
  /** Per client address. */
  perAddress: number;
}

/** The environment is not valid; the message names every bad variable. */
export class ConfigError extends Error {}

/** Reads and checks the environment; throws a ConfigError naming every bad variable. */
export function loadConfig(source: Record<string, string | undefined>): Config {
  // An empty variable (`PORT=`) means "not set", as in most shells' .env habits.
  const present = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = environment.safeParse(present);
  if (!parsed.success) {
    throw new ConfigError(`The environment is not valid:\n  ${formatIssues(parsed.error).join('\n  ')}`);
  }
  const env = parsed.data;
  return {
    env: env.NODE_ENV,
    port: env.PORT,
    host: env.HOST,
    databaseUrl: env.DATABASE_URL,
    dataDir: env.DATA_DIR,
    sessionSecret: env.SESSION_SECRET,
    smtpUrl: env.SMTP_URL,
    mailFrom: env.MAIL_FROM,
    publicUrl: env.PUBLIC_URL?.replace(/\/+$/, ''),
    packAttachLimitBytes: 10 * 1024 * 1024,
    attachmentLimitBytes: 10 * 1024 * 1024,
    signUpOpen: env.SIGNUP === 'open',
    demoAccounts: env.NODE_ENV !== 'production' || env.ALLOW_DEMO_IN_PRODUCTION,
    secureCookies: env.NODE_ENV === 'production',
    trustProxy: env.TRUST_PROXY,
    logLevel: env.LOG_LEVEL ?? (env.NODE_ENV === 'test' ? 'silent' : 'info'),
    session: { idleMs: env.SESSION_IDLE_MINUTES * 60_000, absoluteMs: env.SESSION_MAX_DAYS * 86_400_000 },
    signInThrottle: {
      windowMs: 15 * 60_000,
      perAddress: { free: 10, refuseAfter: 30 },
      perPair: { free: 3, refuseAfter: 10 },
      baseDelayMs: 1000,
      maxDelayMs: 30_000,
      usualAddressDays: 90,
    },
    mailLinks: { invitationMs: env.INVITATION_DAYS * 86_400_000, passwordResetMs: env.PASSWORD_RESET_MINUTES * 60_000, signUpMs: env.SIGNUP_LINK_HOURS * 3_600_000 },
    passwordResetLimits: { windowMs: 60 * 60_000, perAccount: 3, perAddress: 20 },
    signUpLimits: { windowMs: 60 * 60_000, perAccount: 3, perAddress: 10 },
  };
}
