// "Use what we saw" on the road screen, without React: when the offer shows, what the before/after reads, and the
// requests that save a fit and put every record back.
import { describe, expect, it } from 'vitest';
import {
  calibrationOfferFor,
  calibrationRequest,
  calibrationView,
  fitInSlices,
  loadScaleText,
  undoCalibration,
} from '@/components/check-ins/calibration-offer';
import { reforecastFor } from '@/components/check-ins/use-reforecast';
import { lowestAheadText } from '@/components/check-ins/reforecast-view';
import { calibrate } from '@/shared/engine/calibrate';
import type { TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { demoDetail } from '../e2e/fixtures';

const detail = demoDetail('highlandLoop');

const checkIn = (id: string, at: string, socPct: number): CheckInRecord => ({
  id,
  version: 1,
  authorId: 'u1',
  authorName: 'Morag',
  createdAt: at,
  checkIn: { at, socPct, propane: [], harvestWh: null, note: '' },
});

// At the pinewood: Tue 18:00, then Wed 07:00 and Wed 18:00 fuller than the plan says (lighter loads, more sky).
const disagreeing = [
  checkIn('a', '2027-09-14T17:00:00.000Z', 68),
  checkIn('b', '2027-09-15T06:00:00.000Z', 37),
  checkIn('c', '2027-09-15T17:00:00.000Z', 16),
];

describe('the calibration offer', () => {
  it('when the readings at the current stop miss the plan by more than the threshold, then it is offered for that stop', () => {
    const offer = calibrationOfferFor(detail, disagreeing);
    expect(offer).toMatchObject({ kind: 'offer', stopIndex: 1, stopName: 'Glen Carrach pinewood' });
  });

  it('when there are fewer readings at the stop than the fit needs, then nothing is offered', () => {
    expect(calibrationOfferFor(detail, disagreeing.slice(0, 2))).toEqual({ kind: 'none' });
    expect(calibrationOfferFor(detail, [])).toEqual({ kind: 'none' });
  });

  it('when the fit runs in slices, then it gives the same answer as run straight through', async () => {
    const offer = calibrationOfferFor(detail, disagreeing);
    if (offer.kind !== 'offer') throw new Error('no offer');
    const sliced = await fitInSlices(offer, new AbortController().signal, 1);
    expect(sliced).toEqual(calibrate(offer.input, offer.stopIndex, offer.readings));
  });

  it('when the fit is shown, then its "now" forecast is the headline\'s own figure and the calibrated one differs', () => {
    const offer = calibrationOfferFor(detail, disagreeing);
    if (offer.kind !== 'offer') throw new Error('no offer');
    const fit = calibrate(offer.input, offer.stopIndex, offer.readings);
    if (!fit) throw new Error('no fit');
    const view = calibrationView(fit, offer.input, disagreeing);
    const headline = reforecastFor(detail, disagreeing);
    if (headline.state !== 'ready') throw new Error('no headline');
    expect(view.before.lowestAhead).toBe(lowestAheadText(headline.reforecast));
    expect(view.after.lowestAhead).not.toBe(view.before.lowestAhead);
    expect(view.before.openness).toBe('5.5 % open');
    expect(view.before.loads).toBe('loads ×1.00 (±0 %)');
    expect(Number.parseFloat(view.after.fitError)).toBeLessThan(Number.parseFloat(view.before.fitError));
  });

  it.each([
    [1.18, 'loads ×1.18 (+18 %)'],
    [0.59, 'loads ×0.59 (−41 %)'],
    [1, 'loads ×1.00 (±0 %)'],
  ])('when the load scale is %s, then it reads "%s"', (scale, text) => {
    expect(loadScaleText(scale)).toBe(text);
  });

  it('when a fit is saved and then undone, then the undo names every record it changed with its old content and version', () => {
    const offer = calibrationOfferFor(detail, disagreeing);
    if (offer.kind !== 'offer') throw new Error('no offer');
    const fit = calibrate(offer.input, offer.stopIndex, offer.readings);
    const body = fit && calibrationRequest(detail, fit);
    if (!body) throw new Error('no request');
    expect(body.appliances).toEqual(detail.appliances.map((a) => ({ id: a.id, version: 1 })));
    // The server's answer: the stop and every appliance one version on.
    const saved: TripDetail = {
      ...detail,
      stops: detail.stops.map((s) => (s.id === body.stopId ? { ...s, version: 2 } : s)),
      appliances: detail.appliances.map((a) => ({ ...a, version: 2 })),
    };
    const undo = undoCalibration(detail, saved, body.stopId);
    expect(undo).toMatchObject({
      kind: 'calibration',
      stop: {
        stopId: body.stopId,
        version: 2,
        restore: { version: 1, exposure: { kind: 'preset', preset: 'deep-forest' } },
      },
    });
    if (undo?.kind !== 'calibration') throw new Error('no undo');
    expect(undo.appliances).toEqual(
      detail.appliances.map((a) => ({
        applianceId: a.id,
        version: 2,
        restore: { version: 1, runningW: a.appliance.runningW, standbyW: a.appliance.standbyW },
      })),
    );
  });
});
