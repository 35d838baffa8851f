// Engine benchmark (tinybench): prints medians. Targets are reported, not asserted:
// 30-day trip, 40 appliances, three sky scenarios < 2 ms; headroom on that trip < 50 ms; 7-day trip < 0.5 ms.
import { cpus } from 'node:os';
import { Bench } from 'tinybench';
import { findHeadroom, simulateTrip } from '../shared/engine';
import { loadAverage as load } from './load-average';
// The same trips are pinned by the golden test, so the figures measured here are for results known to be unchanged.
import { benchTrip as trip } from '../tests/shared/golden-inputs';

const month = trip(30, 40);
const week = trip(7, 15);
const bench = new Bench({ time: 2000, warmupTime: 500 });
bench
  .add('simulateTrip: 30 days, 40 appliances, 3 sky scenarios', () => {
    simulateTrip(month);
  })
  .add('findHeadroom: same 30-day trip', () => {
    findHeadroom(month);
  })
  .add('simulateTrip: 7 days, 15 appliances, 3 sky scenarios', () => {
    simulateTrip(week);
  });

async function main(): Promise<void> {
  console.log(`${cpus().length} CPUs, load average before: ${load()}`);
  await bench.run();
  const targets = [2, 50, 0.5];
  bench.tasks.forEach((task, i) => {
    const r = task.result;
    const median = r && 'latency' in r ? r.latency.p50 : Number.NaN;
    console.log(`${task.name}: median ${median?.toFixed(3)} ms (target < ${targets[i]} ms)`);
  });
  console.log(`load average after: ${load()}`);
}

void main();
