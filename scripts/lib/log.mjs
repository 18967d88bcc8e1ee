// Step-by-step progress for the bootstrap scripts, and one way to fail with advice.

const started = Date.now();
const elapsed = () => `${((Date.now() - started) / 1000).toFixed(1)}s`;

export function step(message) {
  console.log(`\n▸ ${message}`);
}

export function info(message) {
  console.log(`  ${message}`);
}

export function done(message) {
  console.log(`  ✓ ${message} (${elapsed()})`);
}

export class StepError extends Error {
  constructor(what, advice) {
    super(what);
    this.advice = advice;
  }
}

/** Runs a script's main, printing what failed and what to do instead of a stack trace. */
export async function runMain(main) {
  try {
    await main();
  } catch (error) {
    console.error(`\n✗ ${error instanceof Error ? error.message : String(error)}`);
    if (error instanceof StepError && error.advice) console.error(`  What to do: ${error.advice}`);
    else if (error instanceof Error && error.stack) console.error(error.stack.split('\n').slice(1, 4).join('\n'));
    process.exit(1);
  }
}
