// Precomputation shared by every scenario of one trip: the time grid, where each hour is, local time, ambient
// temperature, sun geometry and clear-sky irradiance, and the appliance loads. Scenarios (sky band, headroom) reuse
// it. The sun is sampled at the start, middle and end of each lit step (Simpson's rule); in a step where it crosses
// the horizon, every 7.5 minutes (composite Simpson), so a sunrise or sunset inside the hour is weighed properly.
import type { EngineInput } from '../schemas/engine-input';
import type { Appliance } from '../schemas/appliance';
import type { DayType, RoutineWindow } from '../schemas/common';
import type { Stop } from '../schemas/trip';
import { haurwitzGhi, ineichenPerez, kastenYoungAirMass, pressureRatio } from './clear-sky';
import type { HeavyLoad } from './battery';
import { extraterrestrialW } from './extraterrestrial';
import { inverterDcDrawW } from './inverter';
import { applianceMeter, scheduledShare } from './loads';
import { windowsShare, type LocalStep } from './routines';
import { leafOff, resolveExposure, type ResolvedExposure } from './site-exposure';
import { dayOfYearUtc, sunPositionInto } from './sun-position';
import { ambientC } from './temperature-curve';
import {
  buildGrid,
  buildSegments,
  fillOffsets,
  HOUR_MS,
  localDayNumber,
  localMinuteOfDay,
  localMonth,
  type Segment,
} from './time-grid';

export const QUARTERS = 4; // generator sub-steps
/** Composite Simpson panels in a step where the sun crosses the horizon: 2 × 4 intervals of 7.5 minutes. */
const HORIZON_PANELS = 4;

/** Sun samples of the trip, lit ones only: step i owns [start[i], start[i + 1]), each with its share of the step. */
export type SunSamples = {
  start: Int32Array;
  /** Simpson weight: the samples of a fully lit step add up to 1. */
  weight: Float64Array;
  atMs: Float64Array;
  /** Apparent (refraction-corrected) altitude and azimuth from north, degrees. */
  altDeg: Float64Array;
  azDeg: Float64Array;
  /** Cosine of the apparent zenith (the beam's direction) and of the true zenith (for the decomposition). */
  cosZ: Float64Array;
  cosZTrue: Float64Array;
  ghiClear: Float64Array;
};

export type Thermostat = { index: number; appliance: Appliance; active: Float64Array; heavyCurrentA: number };

export type Prepared = {
  input: EngineInput;
  n: number;
  startMs: Float64Array;
  stepH: Float64Array;
  offsetMin: Float64Array;
  /** Stop index, or −(drive index + 1) on a drive. */
  where: Int16Array;
  /** Stop whose sky, zone and temperatures apply (the stop left, on a drive). */
  stopOf: Int16Array;
  onRoadShare: Float64Array;
  dayIndex: Int32Array;
  travelDay: Uint8Array;
  /** 1 where trip day d has driving on it. */
  travelByDay: Uint8Array;
  minuteOfDay: Float64Array;
  ambientC: Float64Array;
  lat: Float64Array;
  lon: Float64Array;
  sunAltMid: Float64Array;
  sun: SunSamples;
  dniExtra: Float64Array;
  /** The site exposures of the trip (the open sky first, then each stop's, in leaf and bare where deciduous) … */
  exposures: ResolvedExposure[];
  /** … and which one applies at each step (an open sky on drives). */
  exposureOf: Uint8Array;
  hookupW: Float64Array;
  /** Bit q set: quarter q of the step lies inside the stop's allowed generator hours (or routine). */
  genAllowed: Uint8Array;
  genRoutine: Uint8Array;
  acWh: Float64Array;
  dcWh: Float64Array;
  heatWh: Float64Array;
  acRunningW: Float64Array;
  acSurgeExtraW: Float64Array;
  acStandbyOn: Uint8Array;
  /** Share of the step inside the hours the inverter is kept on (scheduled inverters). */
  inverterOnShare: Float64Array;
  /**
   * Electric Wh of each appliance per step, by its index in the appliance list (the load model's figure, kept so a
   * flag's causes read it instead of working the schedule out again). Empty for thermostat-run appliances: their
   * energy depends on the sky (climate.ts).
   */
  applianceWh: Float64Array[];
  /** Loads whose running current passes the bank's 20-hour current, with their running energy per step (Peukert). */
  heavy: HeavyLoad[];
  /**
   * Heat the fixed loads give the cabin, W (step mean): their electricity. Propane burned for cooking or by an
   * absorption fridge is taken to leave through the vents and flues.
   */
  internalGainW: Float64Array;
  /** Thermostat-run appliances: their index, their active share per step, and their running current if heavy. */
  thermostats: Thermostat[];
};

function segmentAt(segs: readonly Segment[], ms: number, hint: number): number {
  let i = Math.min(hint, segs.length - 1);
  while (i < segs.length - 1 && ms >= (segs[i]?.endMs ?? 0)) i++;
  return i;
}

function fillPlaces(p: Prepared, segs: readonly Segment[], stops: readonly Stop[]): void {
  let seg = 0;
  for (let i = 0; i < p.n; i++) {
    const t = p.startMs[i] ?? 0;
    const dt = p.stepH[i] ?? 1;
    const mid = t + (dt * HOUR_MS) / 2;
    seg = segmentAt(segs, mid, seg);
    const s = segs[seg];
    if (!s) continue;
    if (s.kind === 'stop') {
      const stop = stops[s.index];
      p.where[i] = s.index;
      p.stopOf[i] = s.index;
      p.lat[i] = stop?.lat ?? 0;
      p.lon[i] = stop?.lon ?? 0;
      continue;
    }
    const from = stops[s.index];
    const to = stops[s.index + 1];
    const f = s.endMs > s.startMs ? (mid - s.startMs) / (s.endMs - s.startMs) : 0;
    p.where[i] = -(s.index + 1);
    p.stopOf[i] = s.index;
    p.lat[i] = (from?.lat ?? 0) + f * ((to?.lat ?? 0) - (from?.lat ?? 0));
    p.lon[i] = (from?.lon ?? 0) + f * ((to?.lon ?? 0) - (from?.lon ?? 0));
    const road = Math.max(0, Math.min(t + dt * HOUR_MS, s.roadEndMs) - Math.max(t, s.startMs));
    p.onRoadShare[i] = road / (dt * HOUR_MS);
  }
}

function fillLocalTime(p: Prepared, stops: readonly Stop[]): void {
  // One pass per run of steps in the same zone (consecutive stops usually share one), not per stop: the offsets
  // are the zone's own at each step either way, and each pass costs a luxon look-up per day.
  const zoneAt = (i: number): string => stops[p.stopOf[i] ?? 0]?.timeZone ?? 'UTC';
  let a = 0;
  while (a < p.n) {
    const zone = zoneAt(a);
    let b = a + 1;
    while (b < p.n && zoneAt(b) === zone) b++;
    fillOffsets(zone, p.startMs, a, b, p.offsetMin);
    a = b;
  }
  const firstDay = localDayNumber(p.startMs[0] ?? 0, p.offsetMin[0] ?? 0);
  const travelDays = new Set<number>();
  for (let i = 0; i < p.n; i++) {
    const t = p.startMs[i] ?? 0;
    const off = p.offsetMin[i] ?? 0;
    const day = localDayNumber(t, off) - firstDay;
    p.dayIndex[i] = day;
    p.minuteOfDay[i] = localMinuteOfDay(t, off);
    if ((p.onRoadShare[i] ?? 0) > 0) travelDays.add(day);
    const st = stops[p.stopOf[i] ?? 0];
    const hourOfDay = ((p.minuteOfDay[i] ?? 0) + (p.stepH[i] ?? 1) * 30) / 60;
    p.ambientC[i] = st ? ambientC(st.lowC, st.highC, hourOfDay) : 15;
  }
  for (let i = 0; i < p.n; i++) p.travelDay[i] = travelDays.has(p.dayIndex[i] ?? 0) ? 1 : 0;
  p.travelByDay = new Uint8Array((p.dayIndex[p.n - 1] ?? 0) + 2);
  for (const d of travelDays) if (d >= 0) p.travelByDay[d] = 1;
}

const RAD = Math.PI / 180;

function clearSkyGhi(stop: Stop | undefined, altDeg: number, dniExtra: number): number {
  const zen = 90 - altDeg;
  if (altDeg <= 0) return 0;
  if (stop?.linkeTurbidity === undefined) return haurwitzGhi(zen);
  const am = kastenYoungAirMass(zen) * pressureRatio(stop.elevationM);
  return ineichenPerez({
    zenithDeg: zen,
    airMassAbsolute: am,
    linkeTurbidity: stop.linkeTurbidity,
    elevationM: stop.elevationM,
    dniExtra,
  }).ghi;
}

/** The extraterrestrial irradiance of the last UTC day asked for: worked out once per day, not per step. */
type DayCache = { utcDay: number; dniExtra: number };

function dniExtraAt(c: DayCache, utcMs: number, solarConstant: number): number {
  const utcDay = Math.floor(utcMs / 86_400_000);
  if (utcDay !== c.utcDay) {
    c.utcDay = utcDay;
    c.dniExtra = extraterrestrialW(dayOfYearUtc(utcMs), solarConstant);
  }
  return c.dniExtra;
}

type SampleColumn = Exclude<keyof SunSamples, 'start'>;
const SAMPLE_COLUMNS: readonly SampleColumn[] = ['weight', 'atMs', 'altDeg', 'azDeg', 'cosZ', 'cosZTrue', 'ghiClear'];

/** The sun samples' columns while they are filled: typed arrays with room to spare, doubled when full. */
class SampleColumns {
  length = 0;
  cols: Record<SampleColumn, Float64Array>;

  constructor(capacity: number) {
    this.cols = this.allocate(Math.max(16, capacity));
  }

  private allocate(capacity: number): Record<SampleColumn, Float64Array> {
    const buf = new ArrayBuffer(8 * capacity * SAMPLE_COLUMNS.length);
    const col = (k: number): Float64Array => new Float64Array(buf, 8 * capacity * k, capacity);
    return {
      weight: col(0),
      atMs: col(1),
      altDeg: col(2),
      azDeg: col(3),
      cosZ: col(4),
      cosZTrue: col(5),
      ghiClear: col(6),
    };
  }

  /** The index of a new sample, whose columns the caller then fills. */
  next(): number {
    if (this.length === this.cols.weight.length) {
      const bigger = this.allocate(2 * this.length);
      for (const k of SAMPLE_COLUMNS) bigger[k].set(this.cols[k]);
      this.cols = bigger;
    }
    return this.length++;
  }

  /** The filled part of each column (views, not copies). */
  done(start: Int32Array): SunSamples {
    const c = this.cols;
    const n = this.length;
    return {
      start,
      weight: c.weight.subarray(0, n),
      atMs: c.atMs.subarray(0, n),
      altDeg: c.altDeg.subarray(0, n),
      azDeg: c.azDeg.subarray(0, n),
      cosZ: c.cosZ.subarray(0, n),
      cosZTrue: c.cosZTrue.subarray(0, n),
      ghiClear: c.ghiClear.subarray(0, n),
    };
  }
}

/** Each stop's exposure for the season of each step: deciduous cover is bare in its leaf-off months. */
function fillExposures(p: Prepared, stops: readonly Stop[]): void {
  p.exposures = [resolveExposure({ kind: 'preset', preset: 'open' })];
  // Exposure k for stop w in leaf (2w) or bare (2w + 1); the month is read once per local day, not per step.
  const index = new Map<number, number>();
  let day = Number.NaN;
  let month = 0;
  for (let i = 0; i < p.n; i++) {
    const w = p.where[i] ?? -1;
    const stop = w >= 0 ? stops[w] : undefined;
    if (!stop) continue; // a drive: open sky
    const t = p.startMs[i] ?? 0;
    const off = p.offsetMin[i] ?? 0;
    if (localDayNumber(t, off) !== day) {
      day = localDayNumber(t, off);
      month = localMonth(t, off);
    }
    const bare = stop.exposure.kind === 'canopy' && stop.exposure.deciduous && leafOff(month, stop.lat);
    const key = 2 * w + (bare ? 1 : 0);
    let k = index.get(key);
    if (k === undefined) {
      k = p.exposures.length;
      p.exposures.push(resolveExposure(stop.exposure, month, stop.lat));
      index.set(key, k);
    }
    p.exposureOf[i] = k;
  }
}

function fillSun(p: Prepared, stops: readonly Stop[], solarConstant: number): void {
  const pos = new Float64Array(9); // start, middle, end: apparent altitude, azimuth, true altitude each
  const at = new Float64Array(3);
  const days: DayCache = { utcDay: Number.NaN, dniExtra: 0 };
  const start = new Int32Array(p.n + 1);
  // Room for three samples per step (a lit step takes three; only sunrise and sunset steps take more).
  const lists = new SampleColumns(3 * p.n + 2 * (2 * HORIZON_PANELS + 1));
  const add = (stop: Stop | undefined, ms: number, w: number, v: Float64Array, k: number, dniExtra: number) => {
    const alt = v[k] ?? 0;
    if (alt <= 0) return; // below the horizon: no light, no sample
    const at = lists.next();
    const c = lists.cols;
    c.weight[at] = w;
    c.atMs[at] = ms;
    c.altDeg[at] = alt;
    c.azDeg[at] = v[k + 1] ?? 0;
    c.cosZ[at] = Math.cos((90 - alt) * RAD);
    c.cosZTrue[at] = Math.cos((90 - (v[k + 2] ?? 0)) * RAD);
    c.ghiClear[at] = clearSkyGhi(stop, alt, dniExtra);
  };
  let prevEndMs = Number.NaN;
  let prevLat = Number.NaN;
  let prevLon = Number.NaN;
  for (let i = 0; i < p.n; i++) {
    start[i] = lists.length;
    const t = p.startMs[i] ?? 0;
    const dt = (p.stepH[i] ?? 1) * HOUR_MS;
    const lat = p.lat[i] ?? 0;
    const lon = p.lon[i] ?? 0;
    const stop = stops[p.stopOf[i] ?? 0];
    const dniExtra = dniExtraAt(days, t, solarConstant);
    p.dniExtra[i] = dniExtra;
    sunPositionInto(t + dt / 2, lat, lon, pos, 3);
    p.sunAltMid[i] = pos[3] ?? 0;
    // The sun moves under 8° in half an hour: well below the horizon at mid-step, the whole step is dark.
    if ((pos[3] ?? 0) < -8) {
      prevEndMs = Number.NaN;
      continue;
    }
    // The previous step's end is this step's start when the rig has not moved: reuse it.
    if (prevEndMs === t && prevLat === lat && prevLon === lon) pos.copyWithin(0, 6, 9);
    else sunPositionInto(t, lat, lon, pos, 0);
    sunPositionInto(t + dt, lat, lon, pos, 6);
    prevEndMs = t + dt;
    prevLat = lat;
    prevLon = lon;
    const lit = ((pos[0] ?? 0) > 0 ? 1 : 0) + ((pos[3] ?? 0) > 0 ? 1 : 0) + ((pos[6] ?? 0) > 0 ? 1 : 0);
    if (lit === 3) {
      add(stop, t, 1 / 6, pos, 0, dniExtra);
      add(stop, t + dt / 2, 4 / 6, pos, 3, dniExtra);
      add(stop, t + dt, 1 / 6, pos, 6, dniExtra);
    } else if (lit > 0) {
      // The sun crosses the horizon in this step: composite Simpson over 2 × HORIZON_PANELS intervals.
      const intervals = 2 * HORIZON_PANELS;
      for (let q = 0; q <= intervals; q++) {
        const ms = t + (q * dt) / intervals;
        const w = (q === 0 || q === intervals ? 1 : q % 2 === 1 ? 4 : 2) / (3 * intervals);
        if (q === 0) add(stop, ms, w, pos, 0, dniExtra);
        else if (q === HORIZON_PANELS) add(stop, ms, w, pos, 3, dniExtra);
        else if (q === intervals) add(stop, ms, w, pos, 6, dniExtra);
        else {
          sunPositionInto(ms, lat, lon, at, 0);
          add(stop, ms, w, at, 0, dniExtra);
        }
      }
    }
  }
  start[p.n] = lists.length;
  p.sun = lists.done(start);
}

export function localStep(p: Prepared, i: number): LocalStep {
  return {
    minuteOfDay: p.minuteOfDay[i] ?? 0,
    dayIndex: p.dayIndex[i] ?? 0,
    dayType: p.travelDay[i] ? 'travel' : 'camp',
    durationMin: (p.stepH[i] ?? 1) * 60,
  };
}

export function prevDayType(p: Prepared, i: number): DayType {
  return p.travelByDay[(p.dayIndex[i] ?? 0) - 1] ? 'travel' : 'camp';
}

type Slots = { slotOf: Int32Array; first: number[] };

/**
 * Steps that look the same to a routine (local start minute and length, and, when `withDayTypes`, today's and
 * yesterday's day type) share a slot, so each appliance's routine share is worked out once per slot (a day's
 * worth on a month-long trip) instead of once per step. Windows that name trip days also depend on the day, so
 * those appliances are worked out per step.
 */
function stepSlots(p: Prepared, withDayTypes: boolean): Slots {
  const slotOf = new Int32Array(p.n);
  const first: number[] = [];
  const byNumber = new Map<number, number>();
  const byText = new Map<string, number>();
  for (let i = 0; i < p.n; i++) {
    const minute = p.minuteOfDay[i] ?? 0;
    const stepH = p.stepH[i] ?? 1;
    const types = withDayTypes ? (p.travelDay[i] ? 1 : 0) + (prevDayType(p, i) === 'travel' ? 2 : 0) : 0;
    // Whole minutes and whole hours (nearly every step) key a number; anything else a string.
    const whole = stepH === 1 && Number.isInteger(minute);
    const numKey = minute * 4 + types;
    const textKey = whole ? '' : `${minute}|${stepH}|${types}`;
    let slot = whole ? byNumber.get(numKey) : byText.get(textKey);
    if (slot === undefined) {
      slot = first.length;
      first.push(i);
      if (whole) byNumber.set(numKey, slot);
      else byText.set(textKey, slot);
    }
    slotOf[i] = slot;
  }
  return { slotOf, first };
}

/** Each step's scheduled share for one appliance (scheduledShare in loads.ts, worked out once per slot of steps). */
function fillShares(p: Prepared, a: Appliance, slots: () => { time: Slots; typed: Slots }, share: Float64Array): void {
  const sched = a.schedule;
  const n = p.n;
  const windows = sched.kind === 'routine' ? sched.windows : sched.kind === 'thermostat' ? sched.activeWindows : null;
  if (!windows) share.fill(1, 0, n);
  else if (windows.some((w) => w.days.kind === 'trip-days')) {
    for (let i = 0; i < n; i++) share[i] = scheduledShare(sched, localStep(p, i), prevDayType(p, i));
  } else {
    const all = slots();
    const { slotOf, first } = windows.some((w) => w.days.kind === 'day-type') ? all.typed : all.time;
    const slotShare = new Float64Array(first.length);
    for (let slot = 0; slot < first.length; slot++) {
      const at = first[slot] ?? 0;
      slotShare[slot] = scheduledShare(sched, localStep(p, at), prevDayType(p, at));
    }
    for (let i = 0; i < n; i++) share[i] = slotShare[slotOf[i] ?? 0] ?? 0;
  }
}

function fillLoads(p: Prepared): void {
  const appliances = p.input.appliances;
  const n = p.n;
  // One buffer for every appliance's step energies (one allocation, not one per appliance).
  const energies = new ArrayBuffer(8 * n * appliances.length);
  p.applianceWh = appliances.map((_, j) => new Float64Array(energies, 8 * n * j, n));
  let known: { time: Slots; typed: Slots } | null = null;
  const slots = (): { time: Slots; typed: Slots } =>
    (known ??= { time: stepSlots(p, false), typed: stepSlots(p, true) });
  const share = new Float64Array(n);
  const { stepH, acWh, dcWh, heatWh, acRunningW, acSurgeExtraW, acStandbyOn } = p;
  const battery = p.input.rig.battery;
  const inverter = p.input.rig.inverter;
  /** Battery current while the appliance runs, A; AC loads through the inverter (none without one: unserved). */
  const runningCurrentA = (a: Appliance): number => {
    const w = a.quantity * a.runningW;
    if (a.circuit !== 'ac') return w / battery.nominalV;
    return inverter ? inverterDcDrawW(inverter, w, 0) / battery.nominalV : 0;
  };
  const i20 = battery.capacityAh / 20;
  // Appliance by appliance over all steps: each step's totals still add the appliances in list order.
  for (let j = 0; j < appliances.length; j++) {
    const a = appliances[j];
    if (!a) continue;
    const always = a.schedule.kind === 'always';
    if (!always) fillShares(p, a, slots, share);
    const currentA = runningCurrentA(a);
    if (a.schedule.kind === 'thermostat') {
      p.applianceWh[j] = new Float64Array(0);
      // Heating and cooling depend on the sky (solar gain): their duty is worked out per scenario (climate.ts).
      p.thermostats.push({
        index: j,
        appliance: a,
        active: share.slice(0, n),
        heavyCurrentA: currentA > i20 ? currentA : 0,
      });
      continue;
    }
    const meter = applianceMeter(a);
    const isAc = a.circuit === 'ac';
    const total = isAc ? acWh : dcWh;
    const heats = !isAc && a.heatInputW !== 0;
    const runningTotalW = a.runningW * a.quantity;
    const surgeExtra = (a.surgeW ?? a.runningW) - a.runningW;
    // Off with no standby draw, a step adds exactly 0 to every total (which are never −0), so it is skipped.
    const skipOff = !always && a.standbyW === 0;
    const energy = p.applianceWh[j] ?? new Float64Array(n);
    const running = currentA > i20 ? new Float64Array(n) : null;
    if (running) p.heavy.push({ circuit: isAc ? 'ac' : 'dc', currentA, runningWh: running });
    // Steps with the same share and length draw the same energies: worked out when either changes, not per step.
    let lastShare = Number.NaN;
    let lastStepH = Number.NaN;
    let e = 0;
    let runningE = 0;
    let heatE = 0;
    for (let i = 0; i < n; i++) {
      const sh = always ? 1 : (share[i] ?? 0);
      if (skipOff && sh === 0) continue;
      const dtH = stepH[i] ?? 1;
      if (sh !== lastShare || dtH !== lastStepH) {
        lastShare = sh;
        lastStepH = dtH;
        const runShare = sh * a.dutyCycle;
        e = meter.energyWh(runShare, dtH);
        runningE = running ? meter.runningWh(runShare, dtH) : 0;
        heatE = heats ? meter.heatWh(runShare, dtH) : 0;
      }
      energy[i] = e;
      if (running) running[i] = runningE;
      total[i] = (total[i] ?? 0) + e;
      if (isAc) {
        if (sh > 0) {
          acRunningW[i] = (acRunningW[i] ?? 0) + runningTotalW;
          acSurgeExtraW[i] = Math.max(acSurgeExtraW[i] ?? 0, surgeExtra);
        }
      } else if (heats) heatWh[i] = (heatWh[i] ?? 0) + heatE;
    }
    if (isAc && a.standbyW > 0) acStandbyOn.fill(1, 0, n);
  }
}

function inHourWindow(hourOfDay: number, startHour: number, endHour: number): boolean {
  if (startHour === endHour) return false;
  return startHour < endHour
    ? hourOfDay >= startHour && hourOfDay < endHour
    : hourOfDay >= startHour || hourOfDay < endHour;
}

function fillGenerator(p: Prepared, stops: readonly Stop[]): void {
  const gen = p.input.rig.generator;
  for (let i = 0; i < p.n; i++) {
    const where = p.where[i] ?? 0;
    const stop = where >= 0 ? stops[where] : undefined;
    const hours = stop?.generatorHours ?? null;
    const dtMin = (p.stepH[i] ?? 1) * 60;
    const routineWindows = gen?.mode.kind === 'routine' && stop ? gen.mode.windows : null;
    // The local step is only read by a routine generator's windows.
    const step = routineWindows ? localStep(p, i) : null;
    const prev = routineWindows ? prevDayType(p, i) : 'camp';
    let allowed = 0;
    let routine = 0;
    for (let q = 0; q < QUARTERS; q++) {
      const qMin = (p.minuteOfDay[i] ?? 0) + ((q + 0.5) * dtMin) / QUARTERS;
      const hourOfDay = (qMin / 60) % 24;
      if (hours && inHourWindow(hourOfDay, hours.startHour, hours.endHour)) allowed |= 1 << q;
      if (routineWindows && step) {
        const qStep: LocalStep = {
          ...step,
          minuteOfDay: (step.minuteOfDay + (q * dtMin) / QUARTERS) % 1440,
          durationMin: dtMin / QUARTERS,
        };
        if (windowsShare(routineWindows, qStep, prev) >= 0.5) routine |= 1 << q;
      }
    }
    p.genAllowed[i] = allowed;
    p.genRoutine[i] = routine;
  }
}

/** The hours a scheduled inverter is kept on, as a routine window over every day. */
function fillInverterHours(p: Prepared): void {
  const inv = p.input.rig.inverter;
  if (inv?.mode !== 'scheduled' || !inv.onHours) return;
  const { startHour, endHour } = inv.onHours;
  const hours = startHour === endHour ? 0 : (endHour - startHour + 24) % 24 || 24;
  if (hours === 0) return;
  const window: RoutineWindow = {
    days: { kind: 'all' },
    startHour: startHour % 24,
    startMinute: 0,
    minutes: hours * 60,
  };
  for (let i = 0; i < p.n; i++) p.inverterOnShare[i] = windowsShare([window], localStep(p, i), prevDayType(p, i));
}

function allocate(input: EngineInput, n: number): Prepared {
  // All step columns are views into one ArrayBuffer: one allocation instead of thirty. 8-byte columns first,
  // then 4-, 2- and 1-byte ones, so every view starts aligned. A column added below without counting it here
  // makes the view constructor throw at once.
  const f64 = 17;
  const buf = new ArrayBuffer(n * (8 * f64 + 4 * 1 + 2 * 2 + 1 * 5));
  let at = 0;
  const view = <T>(make: (b: ArrayBuffer, offset: number, length: number) => T, bytes: number, length: number): T => {
    const v = make(buf, at, length);
    at += bytes * length;
    return v;
  };
  const f = (length = n): Float64Array => view((b, o, len) => new Float64Array(b, o, len), 8, length);
  const i32 = (): Int32Array => view((b, o, len) => new Int32Array(b, o, len), 4, n);
  const i16 = (): Int16Array => view((b, o, len) => new Int16Array(b, o, len), 2, n);
  const u8 = (): Uint8Array => view((b, o, len) => new Uint8Array(b, o, len), 1, n);
  return {
    input,
    n,
    startMs: f(),
    stepH: f(),
    offsetMin: f(),
    onRoadShare: f(),
    minuteOfDay: f(),
    ambientC: f(),
    lat: f(),
    lon: f(),
    sunAltMid: f(),
    dniExtra: f(),
    hookupW: f(),
    acWh: f(),
    dcWh: f(),
    heatWh: f(),
    acRunningW: f(),
    acSurgeExtraW: f(),
    inverterOnShare: f(),
    dayIndex: i32(),
    where: i16(),
    stopOf: i16(),
    travelDay: u8(),
    genAllowed: u8(),
    genRoutine: u8(),
    acStandbyOn: u8(),
    travelByDay: new Uint8Array(1),
    exposures: [],
    exposureOf: u8(),
    applianceWh: [],
    heavy: [],
    internalGainW: new Float64Array(n),
    thermostats: [],
    sun: {
      start: new Int32Array(n + 1),
      weight: new Float64Array(0),
      atMs: new Float64Array(0),
      altDeg: new Float64Array(0),
      azDeg: new Float64Array(0),
      cosZ: new Float64Array(0),
      cosZTrue: new Float64Array(0),
      ghiClear: new Float64Array(0),
    },
  };
}

function fillLoadsAndGains(p: Prepared): void {
  fillLoads(p);
  for (let i = 0; i < p.n; i++) p.internalGainW[i] = ((p.acWh[i] ?? 0) + (p.dcWh[i] ?? 0)) / (p.stepH[i] ?? 1);
}

/**
 * The same trip with another list of appliances: the time, sun and places are kept, the loads worked out again.
 * A fix that changes an appliance is checked on this rather than on a whole new precomputation.
 */
export function withAppliances(p: Prepared, appliances: Appliance[]): Prepared {
  const n = p.n;
  const q: Prepared = {
    ...p,
    input: { ...p.input, appliances },
    acWh: new Float64Array(n),
    dcWh: new Float64Array(n),
    heatWh: new Float64Array(n),
    acRunningW: new Float64Array(n),
    acSurgeExtraW: new Float64Array(n),
    acStandbyOn: new Uint8Array(n),
    applianceWh: [],
    heavy: [],
    internalGainW: new Float64Array(n),
    thermostats: [],
  };
  fillLoadsAndGains(q);
  return q;
}

export function prepare(input: EngineInput): Prepared {
  const grid = buildGrid(input.trip);
  const p = allocate(input, grid.n);
  p.startMs.set(grid.startMs);
  p.stepH.set(grid.stepH);
  const stops = input.trip.stops;
  fillPlaces(p, buildSegments(input.trip), stops);
  fillLocalTime(p, stops);
  fillExposures(p, stops);
  fillSun(p, stops, input.options.solarConstantWm2);
  fillLoadsAndGains(p);
  fillGenerator(p, stops);
  fillInverterHours(p);
  for (let i = 0; i < p.n; i++) {
    const w = p.where[i] ?? -1;
    const h = w >= 0 ? stops[w]?.hookup : null;
    p.hookupW[i] = h ? h.amps * h.volts : 0;
  }
  return p;
}
