import { existsSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { done, step } from './log.mjs';
import { ROOT } from './paths.mjs';
import { run } from './run.mjs';

/** Newest modification time under the given paths (files or folders), skipping outputs. */
function newest(paths) {
  let latest = 0;
  const visit = (path) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path)) if (entry !== 'node_modules' && entry !== 'dist') visit(join(path, entry));
    } else latest = Math.max(latest, stat.mtimeMs);
  };
  paths.forEach(visit);
  return latest;
}

const TARGETS = [
  {
    name: 'contracts',
    dir: 'packages/contracts',
    inputs: ['src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'],
    command: ['npm', ['run', 'build', '-w', '@evenset/contracts']],
  },
  {
    name: 'metrology',
    dir: 'packages/metrology',
    inputs: ['src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'],
    command: ['npm', ['run', 'build', '-w', '@evenset/metrology']],
  },
  {
    name: 'api',
    dir: 'apps/api',
    inputs: ['src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'],
    after: ['contracts', 'metrology'],
    command: ['npm', ['run', 'build', '-w', '@evenset/api']],
  },
  {
    name: 'web',
    dir: 'apps/web',
    inputs: ['src', 'index.html', 'public', 'package.json', 'vite.config.ts', 'tsconfig.json'],
    after: ['contracts', 'metrology'],
    command: ['npm', ['run', 'build', '-w', '@evenset/web']],
  },
];

/** Builds each workspace whose sources changed since its last build (a stamp file in dist/). */
export function buildIfStale(names = TARGETS.map((t) => t.name)) {
  step('Build');
  const rebuilt = new Set();
  for (const target of TARGETS.filter((t) => names.includes(t.name))) {
    const dir = join(ROOT, target.dir);
    const stamp = join(dir, 'dist', '.build-stamp');
    const upstreamChanged = (target.after ?? []).some((name) => rebuilt.has(name));
    const stale =
      upstreamChanged || !existsSync(stamp) || newest(target.inputs.map((p) => join(dir, p))) > statSync(stamp).mtimeMs;
    if (!stale) continue;
    run(target.command[0], target.command[1], {
      cwd: ROOT,
      quiet: true,
      advice: `fix the ${target.name} build error shown above.`,
    });
    writeFileSync(stamp, new Date().toISOString());
    rebuilt.add(target.name);
    done(`built ${target.name}`);
  }
  if (rebuilt.size === 0) done('everything is up to date');
}
