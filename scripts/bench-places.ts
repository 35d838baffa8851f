// Place search benchmark (tinybench): prints medians. Target, reported and not asserted: a prefix search
// answers in under 20 ms, from one typed letter to a whole name; nearest towns and a map extent are shown too.
import { cpus } from 'node:os';
import { Bench } from 'tinybench';
import { basemapFor, warmBasemap } from '../server/places/basemap';
import { nearestPlaces, searchPlaces, warmGazetteer } from '../server/places/gazetteer';
import { loadAverage as load } from './load-average';

// What a person types on the way to a place: one letter, a few, a whole name, an accent left out, a qualifier.
const PREFIXES = ['s', 'a', 'sa', 'fo', 'san', 'fort w', 'inverness', 'tromso', 'portland, or', 'zzzz'];

async function main(): Promise<void> {
  console.log(`${cpus().length} CPUs, load average before: ${load()}`);
  let started = performance.now();
  warmGazetteer();
  console.log(`gazetteer index built in ${(performance.now() - started).toFixed(0)} ms`);
  started = performance.now();
  warmBasemap();
  console.log(`basemap scales loaded in ${(performance.now() - started).toFixed(0)} ms`);

  const bench = new Bench({ time: 1000, warmupTime: 200 });
  for (const prefix of PREFIXES) bench.add(`search "${prefix}"`, () => void searchPlaces(prefix, 8));
  bench.add('nearest 5 towns to a pitch', () => void nearestPlaces({ lat: 57.16, lon: -4.79 }, 5));
  let shift = 0;
  // A new extent each time, so the basemap cache never answers.
  bench.add('basemap for a new regional extent', () => {
    shift = (shift + 1) % 1000;
    basemapFor({ west: -6.5 - shift / 1e4, south: 56.5, east: -4, north: 58 });
  });
  await bench.run();
  for (const task of bench.tasks) {
    const r = task.result;
    const median = r && 'latency' in r ? r.latency.p50 : Number.NaN;
    const target = task.name.startsWith('search') ? ' (target < 20 ms)' : '';
    console.log(`${task.name}: median ${median?.toFixed(3)} ms${target}`);
  }
  console.log(`load average after: ${load()}`);
}

void main();
