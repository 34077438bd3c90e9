/**
 * `npm test`: lint and type checks, then vitest (unit tests of src/lib, database tests and API tests
 * against the built server on the real PostgreSQL), then browser specs in Debian's chromium. Every runner's
 * counts are added up; the last line printed is "N passed, N failed" (", N skipped" when any were), and the
 * exit status is non-zero on any failure.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT, TEST_DATABASE, databaseReset, databaseUrl, postgresLease } from './lib/postgres';
import { databaseUp } from './db';
import { migrateLatest, seedDemoIfEmpty } from './lib/migrate';
import { smtpFakeStart } from './lib/smtp-fake';
import { appBuild } from './lib/build';
import { appEnv } from './lib/app-env';
import { serverStart } from './lib/server';
import { aptInstall } from './lib/apt';

interface Counts {
  passed: number;
  failed: number;
  skipped: number;
}
const total: Counts = { passed: 0, failed: 0, skipped: 0 };
const reportDir = join(PROJECT_ROOT, '.data', `test-reports-${process.env.KW_TEST_PORT ?? 4322}`);
/** `npm test -- tests/api/kits.test.ts …`: run only these vitest files (lint and type checks skipped). */
const only = process.argv.slice(2);

function step(name: string, command: string, args: string[], env: NodeJS.ProcessEnv = process.env): boolean {
  console.log(`\n=== ${name} ===`);
  const ok = spawnSync(command, args, { cwd: PROJECT_ROOT, stdio: 'inherit', env }).status === 0;
  if (ok) total.passed += 1;
  else total.failed += 1;
  console.log(`--- ${name}: ${ok ? 'passed' : 'FAILED'}`);
  return ok;
}

/**
 * Runs vitest asynchronously: the SMTP fake lives in this process and must keep answering while the tests
 * send and read mail.
 */
async function vitest(name: string, config: string, env: NodeJS.ProcessEnv): Promise<void> {
  console.log(`\n=== ${name} ===`);
  const out = join(reportDir, `${name.replace(/\W+/g, '-')}.json`);
  rmSync(out, { force: true });
  const child = spawn(
    'npx',
    [
      'vitest',
      'run',
      '--config',
      config,
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${out}`,
      ...(only.length > 0 ? ['--passWithNoTests', ...only] : []),
    ],
    {
      cwd: PROJECT_ROOT,
      stdio: 'inherit',
      env,
    },
  );
  const status = await new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  if (!existsSync(out)) {
    console.log(`--- ${name}: no report (exit ${status}); counted as one failure`);
    total.failed += 1;
    return;
  }
  const report = JSON.parse(readFileSync(out, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
    numFailedTestSuites: number;
  };
  total.passed += report.numPassedTests;
  total.failed +=
    report.numFailedTests + (report.numFailedTests === 0 && status !== 0 ? Math.max(1, report.numFailedTestSuites) : 0);
  total.skipped += report.numPendingTests + report.numTodoTests;
}

/** The Debian packages the tests run, each with a program it installs: the browser, poppler and qpdf. */
const TEST_TOOLS: { pkg: string; bin: string }[] = [
  { pkg: 'chromium', bin: '/usr/bin/chromium' },
  { pkg: 'poppler-utils', bin: '/usr/bin/pdffonts' },
  { pkg: 'qpdf', bin: '/usr/bin/qpdf' },
];

function testToolsEnsure(): void {
  const missing = TEST_TOOLS.filter((t) => !existsSync(t.bin)).map((t) => t.pkg);
  if (missing.length === 0) return;
  console.log(`[test] installing missing Debian packages: ${missing.join(', ')}…`);
  aptInstall(missing);
}

async function main(): Promise<void> {
  mkdirSync(reportDir, { recursive: true });
  const host = '127.0.0.1';
  const port = Number(process.env.KW_TEST_PORT ?? 4322);
  const smtpPort = Number(process.env.KW_TEST_SMTP_PORT ?? 2526);
  const mailHttpPort = Number(process.env.KW_TEST_MAIL_HTTP_PORT ?? 2581);
  // A build folder of this run's own (ignored by git, ESLint and Prettier), so npm start's dist and another
  // run on another KW_TEST_PORT are never overwritten mid-run.
  process.env.KW_OUT_DIR ??= `dist-test-${port}`;
  // Uploaded photos of this run, beside its fresh database (the seed, the server and the tests all read it).
  process.env.KW_STORAGE_DIR ??= join(PROJECT_ROOT, '.data', `uploads-test-${port}`);
  rmSync(process.env.KW_STORAGE_DIR, { recursive: true, force: true });

  if (only.length > 0) console.log(`[test] only ${only.join(' ')}: lint and type checks skipped`);
  else {
    step('lint (eslint + prettier)', 'npm', ['run', '--silent', 'lint']);
    step('types (astro check)', 'npm', ['run', '--silent', 'check']);
  }

  // What this run starts it stops, whatever step fails: the cluster too, unless it was already running (npm
  // start, another run).
  const clusterRelease = postgresLease();
  const started: { stop(): Promise<void> }[] = [];
  try {
    await databaseUp();
    const dbUrl = databaseUrl(TEST_DATABASE);
    await databaseReset(TEST_DATABASE);
    await migrateLatest(dbUrl);
    await seedDemoIfEmpty(dbUrl);
    const mail = await smtpFakeStart(smtpPort, mailHttpPort);
    started.push({ stop: () => mail.close() });
    testToolsEnsure();
    appBuild();
    const env = appEnv({ databaseUrl: dbUrl, host, port, smtpPort, mailHttpPort });
    const serverLog = join(reportDir, 'server.log');
    const server = await serverStart({ ...env, KW_TEST_ROUTES: '1' }, { logFile: serverLog });
    started.push(server);
    const testEnv = {
      ...env,
      KW_TEST_BASE_URL: server.url,
      KW_TEST_MAIL_URL: `http://127.0.0.1:${mailHttpPort}`,
      KW_TEST_DATABASE_URL: dbUrl,
      KW_TEST_SERVER_LOG: serverLog,
      KW_ADMIN_DATABASE_URL: databaseUrl('postgres'),
    };
    await vitest('unit, database and API tests', 'vitest.config.ts', testEnv);
    await vitest('browser tests', 'vitest.browser.config.ts', testEnv);
  } finally {
    for (const s of started.reverse()) await s.stop();
    clusterRelease();
  }
}

main()
  .catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    total.failed += 1;
  })
  .finally(() => {
    const line = `${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ''}`;
    console.log(`\n${line}`);
    process.exit(total.failed > 0 ? 1 : 0);
  });
