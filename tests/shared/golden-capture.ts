// Writes the golden fixtures from the engine as it stands: `npx tsx tests/shared/golden-capture.ts`.
// Run it only when a change to the results is intended, and say so in the commit.
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { GOLDEN_CASES } from './golden-inputs';
import { goldenSummary } from './golden-summary';

for (const [name, input] of Object.entries(GOLDEN_CASES)) {
  const file = resolve(__dirname, 'golden', `${name}.json`);
  writeFileSync(file, `${JSON.stringify(goldenSummary(input), null, 2)}\n`);
  console.log(`wrote ${file}`);
}
