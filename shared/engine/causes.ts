// Causes: what drew the battery down before a flag, in energy. Over the draw-down (from the highest charge since the
// last flag, or the trip's start, to the flag's lowest charge), each step's battery draw is shared out among what it
// fed in proportion to their energy in that step: the DC loads, the AC loads that went through the inverter (not
// those a hookup or a running generator carried) and the inverter's own idle draw and conversion loss; the battery's
// discharge losses are their own cause. An appliance's energy per step is the load model's (loads.ts) as the
// precomputation booked it, or for heating and cooling the running share from the cabin heat balance (climate.ts).
import type { StepLoads } from './climate';
import { applianceEnergyWh } from './loads';
import type { Prepared } from './prepare';
import type { Cause } from './result-types';
import type { LedgerColumns } from './walk';
import { nameInSentence } from './flag-text';

/** Causes under this share of the draw are left out of the list (they would only crowd it). */
const SMALLEST_SHARE = 0.005;

type Ctx = { p: Prepared; l: LedgerColumns; loads: StepLoads };

/** The row the draw-down starts at: the highest charge in from..to (the latest of equals). */
export function drawdownStart(l: LedgerColumns, from: number, to: number): number {
  let best = from;
  for (let i = from; i <= to; i++) if ((l.socPct[i] ?? 0) >= (l.socPct[best] ?? 0)) best = i;
  return best;
}

/** The AC energy of step i that went through the inverter: what the hookup and a running generator did not carry. */
function acThroughInverterWh(ctx: Ctx, i: number): number {
  const { p, l } = ctx;
  const ac = l.acLoadWh[i] ?? 0;
  const hook = Math.min(ac, (p.hookupW[i] ?? 0) * (p.stepH[i] ?? 1));
  return Math.max(0, ac - hook - Math.min(ac - hook, l.generatorWh[i] ?? 0));
}

/** The battery's draw over rows from..to attributed to appliances, the inverter and battery losses, ranked. */
export function attributeDraw(ctx: Ctx, from: number, to: number): Cause[] {
  const { p, l } = ctx;
  const appliances = p.input.appliances;
  // Each row's share of its demand the battery met (0: it met none, the row is skipped) and the share of its AC
  // loads that went through the inverter, worked out once for all the appliances.
  const rows = Math.max(0, to - from + 1);
  const share = new Float64Array(rows);
  const acShare = new Float64Array(rows);
  let inverterWh = 0;
  let batteryLossWh = 0;
  for (let i = from; i <= to; i++) {
    const flow = l.batteryFlowWh[i] ?? 0;
    const draw = Math.max(0, -flow) + (l.energyShortWh[i] ?? 0);
    if (draw <= 0) continue;
    const acInv = acThroughInverterWh(ctx, i);
    const invLoss = l.inverterLossWh[i] ?? 0;
    const dc = l.dcLoadWh[i] ?? 0;
    const demand = dc + acInv + invLoss;
    if (demand <= 0) continue;
    const rowShare = Math.min(1, draw / demand);
    share[i - from] = rowShare;
    acShare[i - from] = (l.acLoadWh[i] ?? 0) > 0 ? acInv / (l.acLoadWh[i] ?? 1) : 0;
    inverterWh += invLoss * rowShare;
    if (flow < 0) batteryLossWh += l.batteryLossWh[i] ?? 0;
  }
  const byAppliance = new Float64Array(appliances.length);
  for (let j = 0; j < appliances.length; j++) {
    const a = appliances[j];
    if (!a) continue;
    // Heating and cooling: the load model on the running share the cabin heat balance gave under this sky; any
    // other appliance: its energy as the precomputation booked it.
    const run = ctx.loads.thermostatRun.get(j);
    const fixedWh = p.applianceWh[j];
    const ac = a.circuit === 'ac';
    let wh = 0;
    for (let k = 0; k < rows; k++) {
      const rowShare = share[k] ?? 0;
      if (rowShare === 0) continue;
      const i = from + k;
      const e = run ? applianceEnergyWh(a, run[i] ?? 0, p.stepH[i] ?? 1) : (fixedWh?.[i] ?? 0);
      if (e <= 0) continue;
      wh += e * rowShare * (ac ? (acShare[k] ?? 0) : 1);
    }
    byAppliance[j] = wh;
  }
  // Added in the list's order (appliances, the inverter, battery losses), so the total is the same number whichever
  // causes are left out below.
  let total = 0;
  for (let j = 0; j < byAppliance.length; j++) total += byAppliance[j] ?? 0;
  total += inverterWh;
  total += batteryLossWh;
  if (total <= 0) return [];
  // Only the causes kept are built, each once and in one shape.
  const causes: Cause[] = [];
  appliances.forEach((a, j) => keepCause(causes, total, 'appliance', a.name, a.id, byAppliance[j] ?? 0));
  keepCause(causes, total, 'inverter', 'inverter idle and conversion', null, inverterWh);
  keepCause(causes, total, 'battery-loss', 'battery losses', null, batteryLossWh);
  return causes.sort((a, b) => b.wh - a.wh);
}

/** Add a cause to the list when its share of the total draw is large enough to name. */
function keepCause(
  causes: Cause[],
  total: number,
  kind: Cause['kind'],
  name: string,
  applianceId: string | null,
  wh: number,
): void {
  const sharePct = (wh / total) * 100;
  if (sharePct / 100 >= SMALLEST_SHARE) causes.push({ kind, name, applianceId, wh, sharePct });
}

/** "roof air conditioner 71 %, fridge 12 %, lights 6 %": the leading causes, as a flag's text names them. */
export function causesText(causes: readonly Cause[], count = 3): string {
  return causes
    .slice(0, count)
    .map((c) => `${c.kind === 'appliance' ? nameInSentence(c.name) : c.name} ${Math.round(c.sharePct)} %`)
    .join(', ');
}
