// Engine benchmark (tinybench): prints medians. Targets are reported, not asserted:
// 30-day trip, 40 appliances, three sky scenarios < 5 ms; the same trip run on 20 recorded years < 60 ms; headroom on that trip < 50 ms; checking
// its flags' fixes (asked for apart from the budget) and the 7-day trip are reported
// for comparison only; the budget of the largest plan the API accepts (what a budget worker does: validate, simulate,
// serialise) < 250 ms.
import { cpus } from 'node:os';
import { Bench } from 'tinybench';
import { computeBudget } from '../server/budget/compute';
import { checkFixes, findHeadroom, simulateTrip } from '../shared/engine';
import { largestPlan } from '../tests/factories/largest-plan';
import { withSyntheticRecord } from '../tests/factories/recorded-weather';
import { loadAverage as load } from './load-average';
// The same trips are pinned by the golden test, so the figures measured here are for results known to be unchanged.
import { benchTrip as trip } from '../tests/shared/golden-inputs';

const month = trip(30, 40);
const week = trip(7, 15);
const largest = largestPlan();
const monthOnRecord = withSyntheticRecord(month, 20);
const bench = new Bench({ time: 2000, warmupTime: 500 });
bench
  .add('simulateTrip: 30 days, 40 appliances, 3 sky scenarios', () => {
    simulateTrip(month);
  })
  .add('simulateTrip: same 30-day trip on 20 recorded years', () => {
    simulateTrip(monthOnRecord);
  })
  .add('findHeadroom: same 30-day trip', () => {
    findHeadroom(month);
  })
  .add('checkFixes: same 30-day trip (the lazy step, every flag)', () => {
    checkFixes(month);
  })
  .add('simulateTrip: 7 days, 15 appliances, 3 sky scenarios', () => {
    simulateTrip(week);
  })
  .add('budget of the largest plan the API accepts (LIMITS), as a worker computes it', () => {
    const outcome = computeBudget(largest);
    if (outcome.kind !== 'ok') throw new Error(`the largest plan did not compute: ${JSON.stringify(outcome)}`);
  });

async function main(): Promise<void> {
  console.log(`${cpus().length} CPUs, load average before: ${load()}`);
  await bench.run();
  const targets: (number | null)[] = [5, 60, 50, null, null, 250];
  bench.tasks.forEach((task, i) => {
    const r = task.result;
    const median = r && 'latency' in r ? r.latency.p50 : Number.NaN;
    const target = targets[i];
    console.log(`${task.name}: median ${median?.toFixed(3)} ms${target ? ` (target < ${target} ms)` : ''}`);
  });
  console.log(`load average after: ${load()}`);
}

void main();
