/** Installs Debian packages with apt-get (as root, or through sudo otherwise). */
import { execFileSync } from 'node:child_process';

export function aptInstall(packages: string[]): void {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const prefix = process.getuid?.() === 0 ? [] : ['sudo'];
  const run = (args: string[]) => {
    const [file, ...rest] = [...prefix, ...args];
    execFileSync(file!, rest, { stdio: 'inherit', env });
  };
  run(['apt-get', 'update', '-qq']);
  run(['apt-get', 'install', '-y', '-qq', ...packages]);
}
