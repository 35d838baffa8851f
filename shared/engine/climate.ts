// Heating and cooling under one sky: each hour the cabin heat balance (cabin.ts) says how far from its set point
// the cabin would float; each thermostat-run appliance, in list order and while its active windows allow, moves the
// heat needed up to its capacity, and its running share is that heat over its capacity. Its electricity (and, for a
// propane heater, its fuel) follow from the running share. Cooling moves heat at the air conditioner's coefficient of
// performance: electricity = heat removed ÷ COP. Heating delivers its input at the heater's efficiency.
//
// Typical figures when an appliance gives none: cooling COP 2.9 (a roof unit of EER about 10, CHECK-VALUES §11,
// from memory); propane furnace or heater 70 % of its heat input reaches the cabin (vented RV furnaces 60–75 %,
// from memory); electric heating 100 % (resistance: every watt becomes heat).
import type { Appliance } from '../schemas/appliance';
import { cabinModel, type CabinModel } from './cabin';
import type { HeavyLoad } from './battery';
import { batteryClimate, type BatteryClimate } from './battery-temperature';
import { applianceMeter } from './loads';
import type { Prepared } from './prepare';

export const COOLING_COP = 2.9;
export const FUEL_HEATER_EFFICIENCY = 0.7;
export const ELECTRIC_HEATER_EFFICIENCY = 1;

/** The loads of every step under one sky: the trip's fixed loads plus heating and cooling, and the cabin's air. */
export type StepLoads = {
  acWh: Float64Array;
  dcWh: Float64Array;
  /** Propane heat input burned, Wh. */
  propaneHeatWh: Float64Array;
  acRunningW: Float64Array;
  acSurgeExtraW: Float64Array;
  acStandbyOn: Uint8Array;
  heavy: HeavyLoad[];
  /** The cabin's air temperature, °C (step mean). */
  cabinC: Float64Array;
  /** Running share of each thermostat-run appliance, by its index in the appliance list. */
  thermostatRun: Map<number, Float64Array>;
  /** The battery's temperature where it sits, what it can deliver, and whether it may charge. */
  battery: BatteryClimate;
};

/** Heat an appliance moves at full duty, W: its own figure, or its watts at its (or the typical) efficiency. */
export function thermostatCapacityW(a: Appliance): number {
  const s = a.schedule;
  if (s.kind !== 'thermostat') return 0;
  if (s.capacityW !== undefined) return a.quantity * s.capacityW;
  if (s.mode === 'cooling') return a.quantity * a.runningW * (s.efficiency ?? COOLING_COP);
  if (a.circuit === 'fuel') return a.quantity * a.heatInputW * (s.efficiency ?? FUEL_HEATER_EFFICIENCY);
  return a.quantity * a.runningW * (s.efficiency ?? ELECTRIC_HEATER_EFFICIENCY);
}

export function climateModel(p: Prepared): CabinModel {
  return cabinModel(p.input.rig.cabin);
}

/** The loads already worked out under another sky with the same air: the steps whose cabin solar gain is the same
 * number have the same loads, and are copied rather than worked out again (the sky band's skies differ from the
 * planned one only in daylight, at the stops whose outlook they shift). */
export type LoadsLike = { cabinSolarW: Float64Array; ambientC: Float64Array; loads: StepLoads };

/**
 * The step loads under a sky whose solar gain into the cabin is cabinSolarW (W, step mean) and whose outside air is
 * ambientC (°C, step mean; the stops' low/high curve unless a record replaces it). The fixed loads are the
 * precomputation's; with no thermostat-run appliance they are used as they are.
 */
export function climateLoads(
  p: Prepared,
  cabinSolarW: Float64Array,
  ambientC = p.ambientC,
  likeLoads?: LoadsLike,
): StepLoads {
  const cabin = climateModel(p);
  const n = p.n;
  const units = p.thermostats;
  const like = likeLoads && likeLoads.ambientC === ambientC && units.length > 0 ? likeLoads : undefined;
  // With no thermostat-run appliance the fixed loads are the loads: shared, not copied. Copying the like loads gives
  // every unchanged step its figures at once.
  const own = <T extends Float64Array | Uint8Array>(fixed: T, liked: T | undefined): T =>
    units.length === 0 ? fixed : ((liked ?? fixed).slice() as T);
  const acWh = own(p.acWh, like?.loads.acWh);
  const dcWh = own(p.dcWh, like?.loads.dcWh);
  const propaneHeatWh = own(p.heatWh, like?.loads.propaneHeatWh);
  const acRunningW = own(p.acRunningW, like?.loads.acRunningW);
  const acSurgeExtraW = own(p.acSurgeExtraW, like?.loads.acSurgeExtraW);
  const acStandbyOn = own(p.acStandbyOn, like?.loads.acStandbyOn);
  const heavy = [...p.heavy];
  const cabinC = like ? like.loads.cabinC.slice() : new Float64Array(n);
  const thermostatRun = new Map<number, Float64Array>();
  // Each unit's fixed figures, worked out once.
  const plans = units.map((t) => {
    const a = t.appliance;
    const run = like?.loads.thermostatRun.get(t.index)?.slice() ?? new Float64Array(n);
    thermostatRun.set(t.index, run);
    if (a.circuit === 'ac' && a.standbyW > 0) acStandbyOn.fill(1);
    // Running energy of a unit whose running current passes the bank's 20-hour current, for Peukert (the like
    // loads list the units' in the same order, after the fixed loads').
    const likeRunningWh = like?.loads.heavy[heavy.length]?.runningWh;
    const load: HeavyLoad | null =
      t.heavyCurrentA > 0
        ? {
            circuit: a.circuit === 'ac' ? 'ac' : 'dc',
            currentA: t.heavyCurrentA,
            runningWh: likeRunningWh?.slice() ?? new Float64Array(n),
          }
        : null;
    if (load) heavy.push(load);
    const s = a.schedule;
    return {
      active: t.active,
      run,
      load,
      meter: applianceMeter(a),
      capacity: thermostatCapacityW(a),
      mode: s.kind === 'thermostat' ? s.mode : ('heating' as const),
      setPointC: s.kind === 'thermostat' ? s.setPointC : 0,
      ac: a.circuit === 'ac',
      standby: a.standbyW > 0,
      runningTotalW: a.quantity * a.runningW,
      surgeExtraW: (a.surgeW ?? a.runningW) - a.runningW,
    };
  });
  for (let i = 0; i < n; i++) {
    if (like) {
      if (cabinSolarW[i] === like.cabinSolarW[i]) continue;
      // A step worked out again starts from the fixed loads, as every step does without like loads.
      acWh[i] = p.acWh[i] ?? 0;
      dcWh[i] = p.dcWh[i] ?? 0;
      propaneHeatWh[i] = p.heatWh[i] ?? 0;
      acRunningW[i] = p.acRunningW[i] ?? 0;
      acSurgeExtraW[i] = p.acSurgeExtraW[i] ?? 0;
      for (const u of plans) {
        u.run[i] = 0;
        if (u.load) u.load.runningWh[i] = 0;
      }
    }
    const dtH = p.stepH[i] ?? 1;
    const gainsW = (cabinSolarW[i] ?? 0) + (p.internalGainW[i] ?? 0) + cabin.peopleW;
    let air = cabin.floatC(ambientC[i] ?? 15, gainsW);
    for (const u of plans) {
      const active = u.active[i] ?? 0;
      let runShare = 0;
      if (active > 0 && u.capacity > 0) {
        runShare = active * Math.min(1, cabin.heatToMove(u.mode, air, u.setPointC) / u.capacity);
        // The step's mean temperature moves by the heat delivered over the active part of the step.
        air += ((u.mode === 'cooling' ? -1 : 1) * runShare * u.capacity) / cabin.ua;
      }
      // Off and without a standby draw, the unit adds nothing this step.
      if (runShare === 0 && !u.standby) continue;
      u.run[i] = runShare;
      const electricWh = u.meter.energyWh(runShare, dtH);
      if (u.ac) {
        acWh[i] = (acWh[i] ?? 0) + electricWh;
        if (runShare > 0) {
          acRunningW[i] = (acRunningW[i] ?? 0) + u.runningTotalW;
          acSurgeExtraW[i] = Math.max(acSurgeExtraW[i] ?? 0, u.surgeExtraW);
        }
      } else {
        dcWh[i] = (dcWh[i] ?? 0) + electricWh;
        propaneHeatWh[i] = (propaneHeatWh[i] ?? 0) + u.meter.heatWh(runShare, dtH);
      }
      if (u.load) u.load.runningWh[i] = u.meter.runningWh(runShare, dtH);
    }
    cabinC[i] = air;
  }
  const b = p.input.rig.battery;
  return {
    acWh,
    dcWh,
    propaneHeatWh,
    acRunningW,
    acSurgeExtraW,
    acStandbyOn,
    heavy,
    cabinC,
    thermostatRun,
    battery: batteryClimate(b.chemistry, b.heatedSpace, cabinC, ambientC),
  };
}
