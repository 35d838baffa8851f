import { spawnSync } from 'node:child_process';
import { ensureWebBuild } from './build-web';
import { decideBrowser, probeMachine, type BrowserDecision } from './find-browser';

// Browser tests need a Chromium and the built web app: find the first (installing Debian's package when root on
// Debian or Ubuntu, or saying how to get one), build the second, then run the tests against both.
function ensureBrowser(): string {
  let decision: BrowserDecision = decideBrowser(probeMachine());
  if (decision.kind === 'install') {
    console.log(decision.announcement);
    for (const [command = '', ...args] of decision.commands) {
      const step = spawnSync(command, args, {
        stdio: 'inherit',
        env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
      });
      if (step.status !== 0) break;
    }
    decision = decideBrowser(probeMachine(), false);
  }
  if (decision.kind !== 'found') {
    console.error(decision.kind === 'missing' ? decision.message : 'No Chromium found.');
    process.exit(1);
  }
  return decision.path;
}

const browser = ensureBrowser();
ensureWebBuild().then(
  () => {
    // Extra arguments (a file, -t "name") go to vitest, so one browser test can be run alone.
    const result = spawnSync('npx', ['vitest', 'run', '--config', 'vitest.e2e.config.mts', ...process.argv.slice(2)], {
      stdio: 'inherit',
      env: { ...process.env, CHROME_PATH: browser },
    });
    process.exit(result.status ?? 1);
  },
  (error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  },
);
