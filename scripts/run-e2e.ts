import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import { ensureWebBuild } from './build-web';

// Browser tests need Debian's Chromium and the built web app; say how to get the first, make the second.
const chromium = process.env.CHROME_PATH ?? '/usr/bin/chromium';
if (!fs.existsSync(chromium)) {
  console.error(
    `Browser tests need Chromium at ${chromium}.\n` +
      'Install it with:  sudo apt-get update && sudo apt-get install -y chromium\n' +
      'or point CHROME_PATH at another Chromium binary.',
  );
  process.exit(1);
}
ensureWebBuild();
// Extra arguments (a file, -t "name") go to vitest, so one browser test can be run alone.
const result = spawnSync('npx', ['vitest', 'run', '--config', 'vitest.e2e.config.mts', ...process.argv.slice(2)], {
  stdio: 'inherit',
});
process.exit(result.status ?? 1);
