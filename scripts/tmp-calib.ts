import { DEMO_TRIPS } from '@/shared/engine';
import { calibrate } from '@/shared/engine/calibrate';
import { calibrationNeed } from '@/shared/engine/calibration-need';
import { reforecastFrom } from '@/shared/engine/reforecast';
import { engineInputSchema } from '@/shared/schemas';
import { changeStay } from '@/shared/stay-change';
const base = engineInputSchema.parse(DEMO_TRIPS.highlandLoop);
const ch = changeStay(base.trip.stops, 1, 1, 'shift-rest');
if (!ch.ok) throw new Error('x');
const plan = { ...base, trip: { ...base.trip, stops: ch.stops } };
const readings = [
  { at: '2027-09-14T17:00:00.000Z', socPct: 68, propane: [], harvestWh: null },
  { at: '2027-09-15T06:00:00.000Z', socPct: Number(process.argv[2] ?? 45), propane: [], harvestWh: null },
  { at: '2027-09-15T17:00:00.000Z', socPct: Number(process.argv[3] ?? 40), propane: [], harvestWh: null },
];
console.log(calibrationNeed(plan, 1, readings));
const t = performance.now();
const fit = calibrate(plan, 1, readings);
console.log(fit?.before, fit?.after, Math.round(performance.now() - t), 'ms');
const latest = readings[2]!;
const a = reforecastFrom(plan, latest)!.result.headline, b = reforecastFrom(fit!.input, latest)!.result.headline;
console.log(a.lowestSocPct, a.lowestAtLocal, b.lowestSocPct, b.lowestAtLocal);
if (fit) console.log(calibrationNeed(fit.input, 1, readings));
