// npm test: the same bootstrap as npm start, then the type check and every test suite:
// unit and API tests against a real PostgreSQL, then browser tests against the started app.
import { bootstrap } from './bootstrap.mjs';
import { ensureChromium } from './lib/chromium.mjs';
import { runMain, step, StepError } from './lib/log.mjs';
import { ROOT } from './lib/paths.mjs';
import { run, runAsync } from './lib/run.mjs';

const JEST = `${ROOT}/node_modules/jest/bin/jest.js`;
const SUITES = ['metrology', 'contracts', 'api', 'web', 'scripts'];

await runMain(async () => {
  const urls = await bootstrap({ withTest: true });
  const env = { TEST_DATABASE_URL: urls.test, FORCE_COLOR: process.env.FORCE_COLOR ?? '0' };

  step('Type check');
  run('npm', ['run', 'typecheck', '--silent'], { cwd: ROOT, advice: 'fix the type errors shown above.' });

  step(`Unit and API tests (${SUITES.join(', ')})`);
  const unit = await runAsync(process.execPath, [JEST, '--selectProjects', ...SUITES, ...process.argv.slice(2)], {
    cwd: ROOT,
    env,
  });

  ensureChromium();
  step('Browser tests (Debian chromium, headless, against the started app)');
  const browser = await runAsync(process.execPath, [JEST, '--selectProjects', 'browser', '--runInBand'], {
    cwd: ROOT,
    env,
  });

  if (unit !== 0 || browser !== 0) {
    throw new StepError(
      `Tests failed: ${[unit !== 0 && 'unit/API', browser !== 0 && 'browser'].filter(Boolean).join(' and ')}.`,
      'read the failures above.',
    );
  }
  step('All tests passed');
});
