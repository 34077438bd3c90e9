/** The environment the built server (or astro dev) gets from npm start, npm run dev and npm test. */
export interface AppEnvOptions {
  databaseUrl: string;
  host: string;
  port: number;
  smtpPort: number;
  mailHttpPort: number;
}

/** Env vars for the app process; values already set in the environment win (except the ones tests pin). */
export function appEnv(o: AppEnvOptions): NodeJS.ProcessEnv {
  return {
    ...process.env,
    ASTRO_TELEMETRY_DISABLED: '1',
    DATABASE_URL: o.databaseUrl,
    HOST: o.host,
    PORT: String(o.port),
    SITE_URL: process.env.SITE_URL ?? `http://${o.host}:${o.port}`,
    SMTP_URL: process.env.SMTP_URL ?? `smtp://127.0.0.1:${o.smtpPort}`,
    MAIL_FROM: process.env.MAIL_FROM ?? 'Kitwright <no-reply@kitwright.example>',
    MAIL_OUTBOX_URL: process.env.SMTP_URL ? '' : `http://127.0.0.1:${o.mailHttpPort}/messages`,
  };
}
