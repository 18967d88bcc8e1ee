import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { done, step } from './log.mjs';
import { ROOT } from './paths.mjs';
import { run } from './run.mjs';

/** `npm ci` when node_modules is missing or older than the lockfile. */
export function ensureDependencies() {
  step('Dependencies');
  const installed = join(ROOT, 'node_modules', '.package-lock.json');
  const lock = join(ROOT, 'package-lock.json');
  if (existsSync(installed) && statSync(installed).mtimeMs >= statSync(lock).mtimeMs) {
    done('node_modules is up to date');
    return;
  }
  run('npm', ['ci', '--no-audit', '--no-fund'], {
    cwd: ROOT,
    advice: 'check the network access to the npm registry, then run the command again.',
  });
  done('installed with npm ci');
}
