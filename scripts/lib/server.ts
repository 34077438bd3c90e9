/** Starts the built app behind our server entry (src/server/serve.ts) as a child process; waits until /api/health answers. */
import { spawn, type ChildProcess } from 'node:child_process';
import { openSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from './postgres';

export interface RunningServer {
  url: string;
  child: ChildProcess;
  stop(): Promise<void>;
}

/** With logFile, the server's stdout and stderr go to that file (tests read it); otherwise to the console. */
export async function serverStart(env: NodeJS.ProcessEnv, opts: { logFile?: string } = {}): Promise<RunningServer> {
  const out = opts.logFile ? openSync(opts.logFile, 'w') : 'inherit';
  const url = `http://${env.HOST}:${env.PORT}`;
  const child = spawn(process.execPath, [join(PROJECT_ROOT, process.env.KW_OUT_DIR ?? 'dist', 'server', 'serve.mjs')], {
    cwd: PROJECT_ROOT,
    env,
    stdio: ['ignore', out, out],
  });
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode} before it answered.`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGTERM');
      throw new Error(`The server did not answer ${url}/api/health within 30 s.`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    child,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}
