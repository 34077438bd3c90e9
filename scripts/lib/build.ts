/** Builds the app (astro build) with output streamed to the console. */
import { spawnSync } from 'node:child_process';
import { PROJECT_ROOT } from './postgres';

export function appBuild(): void {
  const res = spawnSync('npx', ['astro', 'build', '--silent'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1' },
  });
  if (res.status !== 0) throw new Error(`astro build failed (exit ${res.status}).`);
}
