/**
 * The server's configuration: every environment variable the app reads (README, "Configuration"), declared
 * here once with its meaning and default and read through zod. `serverConfig(name)` reads process.env on
 * each call, so a script or test that sets a variable sees it; a value that cannot be used gives the default,
 * as each reader did on its own before. Object storage keeps its own variables with its driver
 * (src/lib/storage/storage.server.ts, `storageFromEnv`), read from here through `serverEnv()`.
 * tests/lib/server-config.test.ts fails when a module elsewhere reads process.env.
 */
import { z } from 'zod';

/** Connections per app instance when DATABASE_POOL_MAX is not set (README); lucia shares this pool. */
export const DATABASE_POOL_MAX_DEFAULT = 10;

/** A set, non-blank text; unset or blank is undefined. */
const text = z.string().trim().min(1).optional().catch(undefined);
/** A whole number ≥ 1, else `fallback`. */
const count = <T extends number | undefined>(fallback: T) =>
  z.coerce
    .number()
    .int()
    .min(1)
    .optional()
    .catch(fallback)
    .transform((n) => n ?? fallback);

const SERVER_CONFIG = {
  /** PostgreSQL connection string; scripts/db.ts sets it for development and tests. */
  DATABASE_URL: text,
  /** Connections of the app's one pool (Knex, shared with lucia). */
  DATABASE_POOL_MAX: count(DATABASE_POOL_MAX_DEFAULT),
  /** The public base URL: links in mail, the Secure cookie flag, allowed origins. */
  SITE_URL: text,
  /** Where the built server listens. */
  HOST: text.transform((v) => v ?? '127.0.0.1'),
  PORT: count(4321),
  /** `off` leaves the job worker (mail delivery, reminders) out of this instance. */
  KW_JOBS: text,
  /** How many proxies of ours stand in front; 0 (X-Forwarded-For ignored) unless a whole number ≥ 1. */
  TRUST_PROXY: count(0),
  /** The SMTP server mail goes to, and the sender it names. */
  SMTP_URL: text,
  MAIL_FROM: text.transform((v) => v ?? 'Kitwright <no-reply@kitwright.example>'),
  /** The SMTP fake's captured-mail endpoint (development and tests). */
  MAIL_OUTBOX_URL: text,
  /** Threads of the work pool; unset, one per core but one. */
  KW_WORK_THREADS: count(undefined),
  /** The office named on reach report PDFs. */
  REACH_OFFICE_NAME: text.transform((v) => v ?? 'Outreach office'),
  /** `1` mounts the test-only routes (npm test). */
  KW_TEST_ROUTES: text,
};
export type ServerConfigName = keyof typeof SERVER_CONFIG;

/** One configuration value, checked, with its default. */
export function serverConfig<K extends ServerConfigName>(name: K): z.output<(typeof SERVER_CONFIG)[K]> {
  return SERVER_CONFIG[name].parse(process.env[name]) as z.output<(typeof SERVER_CONFIG)[K]>;
}

/** The raw environment, for a driver that declares its own variables (object storage). */
export function serverEnv(): Record<string, string | undefined> {
  return process.env;
}
