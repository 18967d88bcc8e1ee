import { existsSync } from 'node:fs';
import { done, info, step, StepError } from './log.mjs';
import { run } from './run.mjs';

export const CHROMIUM = '/usr/bin/chromium';

/** The browser tests drive Debian's chromium; install it with apt when missing (as root). */
export function ensureChromium() {
  step('Chromium for the browser tests');
  if (existsSync(CHROMIUM)) {
    done(`found ${CHROMIUM}`);
    return;
  }
  if (process.getuid?.() !== 0) {
    throw new StepError(
      `${CHROMIUM} is missing.`,
      'install Debian\'s "chromium" package (sudo apt-get install -y chromium).',
    );
  }
  info('installing Debian\'s "chromium" package (about a minute)…');
  const advice = "check that apt can reach Debian's package mirrors, then run the command again.";
  run('apt-get', ['update'], { advice, quiet: true });
  run('apt-get', ['install', '-y', '--no-install-recommends', 'chromium'], {
    advice,
    quiet: true,
    env: { DEBIAN_FRONTEND: 'noninteractive' },
  });
  done('chromium installed');
}
