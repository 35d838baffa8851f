// "Use what we saw", worked out without React: whether the readings at the current stop disagree with the plan
// enough to offer a calibration, what the fit's before and after read as, and the requests that save it and put it
// back. The figures come from the same engine input and re-forecast as the headline, so they agree with it.
import { calibrationSteps, type Calibration, type CalibrationReading } from '@/shared/engine/calibrate';
import { calibrationNeed, readingsAtStop } from '@/shared/engine/calibration-need';
import { latestReading, reforecastFrom } from '@/shared/engine/reforecast';
import type { ApplyCalibrationRequest, TripDetail, UndoFixRequest } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { engineInputSchema, type EngineInput } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { lowestAheadText } from './reforecast-view';
import { currentStopIndex } from './stay-what-if';

export type CalibrationOffer =
  | { kind: 'none' }
  | {
      kind: 'offer';
      stopIndex: number;
      stopName: string;
      /** How far the plan misses the readings now, RMS in % of the bank. */
      rmsPct: number;
      input: EngineInput;
      readings: CalibrationReading[];
      /** Changes whenever a record the fit reads or writes changes: a fit made on another key is stale. */
      key: string;
    };

const readingsOf = (checkIns: readonly CheckInRecord[]): CalibrationReading[] =>
  checkIns.map(({ checkIn }) => ({
    at: checkIn.at,
    socPct: checkIn.socPct,
    propane: checkIn.propane,
    harvestWh: checkIn.harvestWh,
  }));

// The last answer, keyed by its input and readings: re-rendering must not walk the plan again.
let last: { key: string; value: CalibrationOffer } | undefined;

/** The offer for the stop of the latest check-in, when its readings disagree with the plan. */
export function calibrationOfferFor(detail: TripDetail, checkIns: readonly CheckInRecord[]): CalibrationOffer {
  const draft = toEngineInput(detail);
  if (!draft || checkIns.length === 0) return { kind: 'none' };
  const stopIndex = currentStopIndex(detail, checkIns, new Date());
  const stop = detail.stops[stopIndex];
  if (!stop) return { kind: 'none' };
  const readings = readingsAtStop(stop.stop, readingsOf(checkIns));
  const key = JSON.stringify([draft, stopIndex, readings]);
  if (last?.key === key) return last.value;
  const parsed = engineInputSchema.safeParse(draft);
  let value: CalibrationOffer = { kind: 'none' };
  if (parsed.success) {
    const need = calibrationNeed(parsed.data, stopIndex, readings);
    if (need.kind === 'disagrees')
      value = {
        kind: 'offer',
        stopIndex,
        stopName: stop.stop.name,
        rmsPct: need.rmsPct,
        input: parsed.data,
        readings,
        key,
      };
  }
  last = { key, value };
  return value;
}

/** The fit, run in slices of about `sliceMs` between frames so the screen keeps answering; stops when aborted. */
export function fitInSlices(
  offer: Extract<CalibrationOffer, { kind: 'offer' }>,
  signal: AbortSignal,
  sliceMs = 24,
): Promise<Calibration | undefined> {
  const steps = calibrationSteps(offer.input, offer.stopIndex, offer.readings);
  return new Promise((resolve, reject) => {
    const slice = () => {
      if (signal.aborted) return reject(new DOMException('Fit stopped', 'AbortError'));
      const until = Date.now() + sliceMs;
      let next = steps.next();
      while (!next.done && Date.now() < until) next = steps.next();
      if (next.done) resolve(next.value);
      else setTimeout(slice, 0);
    };
    setTimeout(slice, 0);
  });
}

/** Openness to the nearest percent, or a tenth of one in deep shade, where whole percents hide the difference. */
const opennessText = (v: number) => `${v < 10 ? v.toFixed(1) : Math.round(v)} % open`;

/** "loads ×1.18 (+18 %)": the scale on every appliance's draws. */
export function loadScaleText(scale: number): string {
  const change = Math.round((scale - 1) * 100);
  const sign = change > 0 ? '+' : change < 0 ? '−' : '±';
  return `loads ×${scale.toFixed(2)} (${sign}${Math.abs(change)} %)`;
}

export type CalibrationSide = { openness: string; loads: string; fitError: string; lowestAhead: string };
export type CalibrationView = { before: CalibrationSide; after: CalibrationSide };

/** The before/after the traveller decides on; the forecasts run from the latest check-in, as the headline's does. */
export function calibrationView(
  fit: Calibration,
  input: EngineInput,
  checkIns: readonly CheckInRecord[],
): CalibrationView {
  const latest = latestReading(checkIns.map((c) => c.checkIn));
  const ahead = (plan: EngineInput) => {
    const re = latest ? reforecastFrom(plan, latest) : undefined;
    return re ? lowestAheadText(re) : 'nothing left to forecast';
  };
  const side = (f: Calibration['before'], plan: EngineInput): CalibrationSide => ({
    openness: opennessText(f.opennessPct),
    loads: loadScaleText(f.loadScale),
    fitError: `${f.rmsPct.toFixed(1)} % of the bank`,
    lowestAhead: ahead(plan),
  });
  return { before: side(fit.before, input), after: side(fit.after, fit.input) };
}

/** The request that saves a fit: the stop and every appliance named with the version the fit was made on. */
export function calibrationRequest(detail: TripDetail, fit: Calibration): ApplyCalibrationRequest | undefined {
  const stop = detail.stops[fit.stopIndex];
  if (!stop) return undefined;
  return {
    stopId: stop.id,
    stopVersion: stop.version,
    skyOpennessPct: fit.after.opennessPct,
    loadScale: fit.after.loadScale,
    appliances: detail.appliances.map((a) => ({ id: a.id, version: a.version })),
  };
}

/** The undo of a saved calibration: every record it changed, as it stood before (`was`), from its new version. */
export function undoCalibration(was: TripDetail, now: TripDetail, stopId: string): UndoFixRequest | undefined {
  const before = was.stops.find((s) => s.id === stopId);
  const after = now.stops.find((s) => s.id === stopId);
  if (!before || !after) return undefined;
  const appliances = was.appliances.flatMap((a) => {
    const changed = now.appliances.find((n) => n.id === a.id);
    return changed
      ? [
          {
            applianceId: a.id,
            version: changed.version,
            restore: { version: a.version, runningW: a.appliance.runningW, standbyW: a.appliance.standbyW },
          },
        ]
      : [];
  });
  return {
    kind: 'calibration',
    stop: { stopId, version: after.version, restore: { version: before.version, exposure: before.stop.exposure } },
    appliances,
  };
}
