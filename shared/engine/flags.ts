export { ASSUMED_GENERATOR_W } from './fixes';
// Flags: where the budget breaks, why and how big. Their fixes are checked apart (check-fixes.ts), on request.
import type { Appliance } from '../schemas/appliance';
import { localIso, utcIso, whereAt, whereText } from './describe';
import { momentText, nameInSentence, shortfallText } from './flag-text';
import { CONTINUOUS_SHARE } from './generator';
import { dcCurrentA, inverterDcDrawW } from './inverter';
import type { StepLoads } from './climate';
import { scheduledShare } from './loads';
import { prevDayType, type Prepared } from './prepare';
import { attributeDraw, causesText, drawdownStart } from './causes';
import type { Cause, Flag, FlagLowest, FlagWindow } from './result-types';
import { localLabel, utcIsoString } from './time-grid';
import type { LedgerColumns } from './walk';

const HIGH_CURRENT_A = 150;

export type FlagContext = {
  p: Prepared;
  l: LedgerColumns;
  loads: StepLoads;
  capacityWh: number;
  reservePct: number;
};

/** The rows first..last on the ledger's hour grid: the first row's start and the last row's end. */
export function windowOf(p: Prepared, first: number, last: number): FlagWindow {
  const endMs = (p.startMs[last] ?? 0) + (p.stepH[last] ?? 1) * 3_600_000;
  // The end is the next row's start, labelled in that row's offset (a clock change can fall between them).
  const endOffset = p.offsetMin[last + 1] ?? p.offsetMin[last] ?? 0;
  return {
    firstRow: first,
    lastRow: last,
    startUtc: utcIso(p, first),
    startLocal: localIso(p, first),
    endUtc: utcIsoString(endMs),
    endLocal: localLabel(endMs, endOffset),
  };
}

/** The row of the lowest charge in first..last (the earliest of equals), labelled as the ledger labels it. */
export function lowestOf(p: Prepared, l: LedgerColumns, first: number, last: number): FlagLowest {
  let low = first;
  for (let i = first + 1; i <= last; i++) if ((l.socPct[i] ?? 100) < (l.socPct[low] ?? 100)) low = i;
  return { socPct: l.socPct[low] ?? 0, row: low, atUtc: utcIso(p, low), atLocal: localIso(p, low) };
}

/** The figures every flag carries, for a window of rows. */
function flagFigures(ctx: FlagContext, first: number, last: number) {
  const { p, l, capacityWh, reservePct } = ctx;
  const lowest = lowestOf(p, l, first, last);
  let energyShortWh = 0;
  for (let i = first; i <= last; i++) energyShortWh += l.energyShortWh[i] ?? 0;
  const belowReserveWh = Math.max(0, ((reservePct - lowest.socPct) / 100) * capacityWh);
  return {
    atUtc: lowest.atUtc,
    atLocal: lowest.atLocal,
    window: windowOf(p, first, last),
    energyShortWh,
    belowReserveWh,
    lowest,
    drawdown: { firstRow: lowest.row, lastRow: lowest.row },
    causes: [] as Cause[],
  };
}

/** The flags whose energy short the headline adds up: the battery below its reserve or empty. */
export const isShortfall = (f: Pick<Flag, 'kind'>): boolean => f.kind === 'energy-short' || f.kind === 'below-reserve';

const inShortfall = (ctx: FlagContext, i: number): boolean =>
  (ctx.l.socPct[i] ?? 100) < ctx.reservePct - 1e-9 || (ctx.l.energyShortWh[i] ?? 0) > 0;

function shortfallFlags(ctx: FlagContext): Flag[] {
  const { p, reservePct } = ctx;
  const flags: Flag[] = [];
  let i = 0;
  let afterLast = 0;
  while (i < p.n) {
    if (!inShortfall(ctx, i)) {
      i++;
      continue;
    }
    const start = i;
    while (i < p.n && inShortfall(ctx, i)) i++;
    const figures = flagFigures(ctx, start, i - 1);
    const low = figures.lowest.row;
    figures.drawdown = { firstRow: drawdownStart(ctx.l, afterLast, low), lastRow: low };
    figures.causes = attributeDraw(ctx, figures.drawdown.firstRow, low);
    afterLast = i;
    const where = whereAt(p, low);
    const kind = figures.energyShortWh > 0 ? 'energy-short' : 'below-reserve';
    flags.push({
      id: `${kind}-${start}`,
      kind,
      severity: 'danger',
      ...figures,
      where,
      cause: shortfallText({
        whereText: whereText(p, where),
        kind,
        energyShortWh: figures.energyShortWh,
        belowReserveWh: figures.belowReserveWh,
        reservePct,
        window: figures.window,
        lowest: figures.lowest,
        causesText: causesText(figures.causes),
      }),
      // The title's figure is the text's: energy short when the battery ran empty, else the distance below reserve.
      size: { value: Math.round(kind === 'energy-short' ? figures.energyShortWh : figures.belowReserveWh), unit: 'Wh' },
    });
  }
  return flags;
}

/**
 * Whether the inverter is asked more than its rating (running, or running plus surges) in step i: not on a hookup,
 * and not while a generator runs the whole step within its continuous rating (either carries the AC loads then).
 */
export function overloadedAt(p: Prepared, loads: StepLoads, generatorH: Float64Array, i: number): boolean {
  const inv = p.input.rig.inverter;
  if (!inv || (p.hookupW[i] ?? 0) > 0) return false;
  const running = loads.acRunningW[i] ?? 0;
  const gen = p.input.rig.generator;
  const genCarries = gen !== null && (generatorH[i] ?? 0) >= (p.stepH[i] ?? 1) - 1e-9;
  if (genCarries && running <= gen.ratedW * CONTINUOUS_SHARE) return false;
  const surgeW = inv.surgeW ?? inv.ratedW * 2;
  return running > inv.ratedW || running + (loads.acSurgeExtraW[i] ?? 0) > surgeW;
}

function overloadFlags(ctx: FlagContext): Flag[] {
  const { p, loads } = ctx;
  const inv = p.input.rig.inverter;
  if (!inv) return [];
  const seen = new Set<number>();
  const flags: Flag[] = [];
  for (let i = 0; i < p.n; i++) {
    if (seen.has(p.where[i] ?? 0) || !overloadedAt(p, loads, ctx.l.generatorH, i)) continue;
    const running = loads.acRunningW[i] ?? 0;
    seen.add(p.where[i] ?? 0);
    const where = whereAt(p, i);
    const names = runningAc(ctx, i).map((a) => nameInSentence(a.name));
    flags.push({
      id: `inverter-overload-${i}`,
      kind: 'inverter-overload',
      severity: 'warning',
      ...flagFigures(ctx, i, i),
      where,
      cause: `At ${whereText(p, where)} at ${momentText(localIso(p, i))} the AC loads scheduled together (${names.join(', ')}) can ask ${Math.round(running)} W of a ${inv.ratedW} W inverter`,
      size: { value: Math.round(running), unit: 'W' },
    });
  }
  return flags;
}

/** AC appliances running in step i: scheduled on, or (thermostats) with a running share from the heat balance. */
export function runningAc(ctx: Pick<FlagContext, 'p' | 'loads'>, i: number): Appliance[] {
  const { p, loads } = ctx;
  const step = {
    minuteOfDay: p.minuteOfDay[i] ?? 0,
    dayIndex: p.dayIndex[i] ?? 0,
    dayType: p.travelDay[i] ? ('travel' as const) : ('camp' as const),
    durationMin: (p.stepH[i] ?? 1) * 60,
  };
  return p.input.appliances.filter((a, j) => {
    if (a.circuit !== 'ac') return false;
    const run = loads.thermostatRun.get(j);
    return run ? (run[i] ?? 0) > 0 : scheduledShare(a.schedule, step, prevDayType(p, i)) > 0;
  });
}
/** Common inverter ratings, W (sizes sold for vans, caravans and trailers; common practice). */
export const INVERTER_SIZES_W = [300, 600, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 5000, 6000, 8000] as const;

/** The smallest common inverter size at or above w (the largest listed when none is). */
export function nextInverterW(w: number): number {
  return INVERTER_SIZES_W.find((s) => s >= w) ?? INVERTER_SIZES_W[INVERTER_SIZES_W.length - 1] ?? w;
}

function coldFlags(ctx: FlagContext): Flag[] {
  const { p, l } = ctx;
  const seen = new Set<number>();
  const flags: Flag[] = [];
  for (let i = 0; i < p.n; i++) {
    if (!l.coldBlocked[i] || seen.has(p.where[i] ?? 0)) continue;
    seen.add(p.where[i] ?? 0);
    let hours = 0;
    for (let j = 0; j < p.n; j++) if (l.coldBlocked[j] && p.where[j] === p.where[i]) hours += p.stepH[j] ?? 1;
    const where = whereAt(p, i);
    flags.push({
      id: `cold-charge-blocked-${i}`,
      kind: 'cold-charge-blocked',
      severity: 'warning',
      ...flagFigures(ctx, i, i),
      where,
      cause: `Below 0 °C at ${whereText(p, where)} from ${momentText(localIso(p, i))} the lithium battery must not charge; charging is held off for ${hours.toFixed(0)} h`,
      size: { value: hours, unit: 'h' },
    });
  }
  return flags;
}

function propaneFlags(ctx: FlagContext): Flag[] {
  const { p, l } = ctx;
  let burned = 0;
  let outAt = -1;
  for (let i = 0; i < p.n; i++) {
    burned += l.propaneBurnedKg[i] ?? 0;
    if (outAt < 0 && (l.propaneLeftKg[i] ?? 0) <= 0 && (l.propaneBurnedKg[i] ?? 0) > 0) outAt = i;
  }
  if (outAt < 0) return [];
  const startKg = p.input.rig.propaneTanks.reduce((s, t) => s + (t.propaneKg * t.fillPct) / 100, 0);
  const extraKg = Math.ceil((burned - startKg) * 10) / 10;
  const where = whereAt(p, outAt);
  return [
    {
      id: `propane-out-${outAt}`,
      kind: 'propane-out',
      severity: 'danger',
      ...flagFigures(ctx, outAt, outAt),
      where,
      cause: `Propane runs out at ${whereText(p, where)} at ${momentText(localIso(p, outAt))}; the plan burns ${burned.toFixed(1)} kg against ${startKg.toFixed(1)} kg aboard`,
      size: { value: extraKg, unit: 'kg' },
    },
  ];
}

function cablingFlags(ctx: FlagContext): Flag[] {
  const { p } = ctx;
  const inv = p.input.rig.inverter;
  if (!inv) return [];
  const amps = dcCurrentA(inverterDcDrawW(inv, inv.ratedW, 1), p.input.rig.battery.nominalV);
  if (amps < HIGH_CURRENT_A) return [];
  const where = whereAt(p, 0);
  return [
    {
      id: 'high-dc-current',
      kind: 'high-dc-current',
      severity: 'info',
      ...flagFigures(ctx, 0, 0),
      where,
      cause: `At full output the ${inv.ratedW} W inverter draws about ${Math.round(amps)} A from the ${p.input.rig.battery.nominalV} V bank`,
      size: { value: Math.round(amps), unit: 'A' },
    },
  ];
}

export function buildFlags(ctx: FlagContext): Flag[] {
  return [...shortfallFlags(ctx), ...propaneFlags(ctx), ...coldFlags(ctx), ...overloadFlags(ctx), ...cablingFlags(ctx)];
}

/** Whether a flag happens at a time (its header shows one); a rig's cabling current holds all trip. */
export const hasMoment = (f: Pick<Flag, 'kind'>): boolean => f.kind !== 'high-dc-current';
