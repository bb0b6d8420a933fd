// What a test script must undo on the way out (servers, folders), run in reverse order at the end or
// on Ctrl-C. Only Node built-ins.
import { log } from "./system.mjs";

/** A list of undo steps; `push` adds one, `run` runs them all, last first, each failure only logged. */
export function cleanupList() {
  const steps = [];
  const run = async () => {
    for (const step of steps.reverse()) {
      try {
        await step();
      } catch (err) {
        log(`cleanup: ${err.message}`);
      }
    }
    steps.length = 0;
  };
  for (const sig of ["SIGINT", "SIGTERM"]) {
    process.on(sig, async () => {
      await run();
      process.exit(130);
    });
  }
  return { push: (step) => steps.push(step), run };
}
