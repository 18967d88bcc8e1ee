import { spawn, spawnSync } from 'node:child_process';
import { StepError } from './log.mjs';

/** Runs a command with inherited output; throws a StepError naming it when it fails. */
export function run(command, args, { env, cwd, advice, quiet = false, user } = {}) {
  const [cmd, argv] = user ? ['runuser', ['-u', user, '--', command, ...args]] : [command, args];
  const result = spawnSync(cmd, argv, {
    stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit',
    env: { ...process.env, ...env },
    cwd,
    encoding: 'utf8',
  });
  if (result.error) throw new StepError(`Could not run ${command}: ${result.error.message}`, advice);
  if (result.status !== 0) {
    const output = quiet ? `\n${(result.stdout ?? '') + (result.stderr ?? '')}`.trimEnd() : '';
    throw new StepError(`"${[command, ...args].join(' ')}" failed (exit ${result.status}).${output}`, advice);
  }
  return result.stdout ?? '';
}

/** Runs a command and resolves with its exit code; used for long-running children such as jest. */
export function runAsync(command, args, { env, cwd } = {}) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { stdio: 'inherit', env: { ...process.env, ...env }, cwd });
    const forward = (signal) => child.kill(signal);
    process.on('SIGINT', forward);
    process.on('SIGTERM', forward);
    child.on('exit', (code, signal) => {
      process.off('SIGINT', forward);
      process.off('SIGTERM', forward);
      resolve(code ?? (signal ? 1 : 0));
    });
  });
}
