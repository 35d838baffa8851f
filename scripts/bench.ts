// Engine benchmark (tinybench): prints medians. Targets are reported, not asserted:
// 30-day trip, 40 appliances, three sky scenarios < 2 ms; headroom on that trip < 50 ms; 7-day trip < 0.5 ms.
import { Bench } from 'tinybench';
import { APPLIANCE_LIBRARY, applianceFromLibrary, findHeadroom, simulateTrip } from '../shared/engine';
import type { ApplianceInput, EngineInputDraft } from '../shared/schemas';

function appliances(count: number): ApplianceInput[] {
  return Array.from({ length: count }, (_, i) => {
    const item = APPLIANCE_LIBRARY[i % APPLIANCE_LIBRARY.length];
    return applianceFromLibrary(item?.key ?? 'led-lights', { id: `a${i}` });
  });
}

function trip(days: number, applianceCount: number): EngineInputDraft {
  const stopsCount = Math.max(2, Math.round(days / 4));
  const stopDays = days / stopsCount;
  const start = Date.parse('2027-06-01T12:00Z');
  const stops = Array.from({ length: stopsCount }, (_, i) => ({
    name: `Stop ${i + 1}`, lat: 44 + i * 0.3, lon: -110 + i * 0.4, timeZone: 'America/Denver',
    arriveAt: new Date(start + i * stopDays * 86_400_000).toISOString(),
    departAt: new Date(start + ((i + 1) * stopDays - 0.125) * 86_400_000).toISOString(),
    exposure: { kind: 'preset' as const, preset: (['open', 'light-cover', 'partial-shade', 'deep-forest'] as const)[i % 4] ?? 'open' },
    skyOutlook: (['clear', 'hazy', 'broken-cloud'] as const)[i % 3] ?? 'clear', lowC: 8, highC: 27,
    hookup: i % 5 === 2 ? { amps: 30, volts: 120 } : null,
  }));
  return {
    trip: { name: 'Bench', stops, drives: stops.slice(1).map(() => ({ hoursOnRoad: 2.5 })) },
    rig: {
      name: 'Bench rig', battery: { chemistry: 'lifepo4', capacityAh: 400, nominalV: 12.8 },
      solarArrays: [{ ratedW: 600, mounting: 'flat' }, { ratedW: 200, mounting: 'tilted', tiltDeg: 35, azimuthDeg: 180, fit: 'racked' }],
      controller: { kind: 'mppt', maxAmps: 60 }, inverter: { ratedW: 3000, surgeW: 6000 }, shoreCharger: { amps: 40 },
      vehicleCharger: { kind: 'dc-dc', amps: 30 }, generator: { ratedW: 2200, fuel: 'propane' },
      propaneTanks: [{ propaneKg: 9 }, { propaneKg: 9 }],
    },
    appliances: appliances(applianceCount),
    options: { skyBand: true },
  };
}

const month = trip(30, 40);
const week = trip(7, 15);
const bench = new Bench({ time: 2000, warmupTime: 500 });
bench
  .add('simulateTrip: 30 days, 40 appliances, 3 sky scenarios', () => { simulateTrip(month); })
  .add('findHeadroom: same 30-day trip', () => { findHeadroom(month); })
  .add('simulateTrip: 7 days, 15 appliances, 3 sky scenarios', () => { simulateTrip(week); });

async function main(): Promise<void> {
  await bench.run();
  const targets = [2, 50, 0.5];
  bench.tasks.forEach((task, i) => {
    const r = task.result;
    const median = r && 'latency' in r ? r.latency.p50 : Number.NaN;
    console.log(`${task.name}: median ${median?.toFixed(3)} ms (target < ${targets[i]} ms)`);
  });
}

void main();
