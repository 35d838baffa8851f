import { toBudgetResult } from '@/shared/budget-result';
import { describe, expect, it } from 'vitest';
import { draftFromRecord, draftToFields, emptyDraft } from '@/components/check-ins/check-in-draft';
import { currentStopIndex, stayOutcome } from '@/components/check-ins/stay-what-if';
import { reforecastChart, reforecastHeadline, weekdayTime } from '@/components/check-ins/reforecast-view';
import { DEMO_TRIPS, simulateParsed } from '@/shared/engine';
import { reforecastFrom } from '@/shared/engine/reforecast';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { engineInputSchema } from '@/shared/schemas/engine-input';
import { demoDetail } from '../e2e/fixtures';

const ZONE = 'Europe/London';

describe('check-in form', () => {
  it('when the time is left blank, then no time is sent (the server takes now)', () => {
    const result = draftToFields({ ...emptyDraft(2), socPct: 68 }, ZONE);
    expect(result).toEqual({ ok: true, fields: { socPct: 68, propane: [], harvestWh: null, note: '' } });
  });

  it('when a local time and cylinders are filled in, then the time carries the zone offset and the shares are 0–1', () => {
    const draft = {
      ...emptyDraft(3),
      time: '2027-09-14 18:00',
      socPct: 68,
      cylinders: [
        { choice: 'part' as const, amount: 40 },
        { choice: 'unread' as const, amount: null },
        { choice: 'weight' as const, amount: 2.5 },
      ],
      harvestWh: 250,
    };
    const result = draftToFields(draft, ZONE);
    expect(result).toEqual({
      ok: true,
      fields: {
        at: '2027-09-14T18:00+01:00',
        socPct: 68,
        propane: [
          { tank: 0, reading: { kind: 'fraction', share: 0.4 } },
          { tank: 2, reading: { kind: 'weight', kg: 2.5 } },
        ],
        harvestWh: 250,
        note: '',
      },
    });
  });

  it.each([
    ['no charge', { socPct: null }, 'socPct'],
    ['a charge above 100', { socPct: 120 }, 'socPct'],
    ['a time in another shape', { socPct: 50, time: '14/9 6pm' }, 'time'],
  ])('when the form has %s, then a message sits beside that field', (_what, change, field) => {
    const result = draftToFields({ ...emptyDraft(1), ...change }, ZONE);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors)).toContain(field);
  });

  it('when a part-full cylinder has no amount, then the cylinder field says what to type', () => {
    const result = draftToFields(
      {
        ...emptyDraft(2),
        socPct: 50,
        cylinders: [
          { choice: 'unread', amount: null },
          { choice: 'part', amount: null },
        ],
      },
      ZONE,
    );
    expect(result).toEqual({ ok: false, errors: { cylinder1: 'Use a percentage from 0 to 100.' } });
  });

  it('when a stored reading is edited, then the form shows it as it was typed', () => {
    const record: CheckInRecord = {
      id: 'c1',
      version: 2,
      authorId: 'u1',
      authorName: 'Ewan',
      createdAt: '2027-09-14T17:05:00.000Z',
      checkIn: {
        at: '2027-09-14T18:00+01:00',
        socPct: 68,
        propane: [{ tank: 1, reading: { kind: 'fraction', share: 0.35 } }],
        harvestWh: null,
        note: 'fan',
      },
    };
    const draft = draftFromRecord(record, 2);
    expect(draft).toMatchObject({ time: '2027-09-14 18:00', socPct: 68, note: 'fan' });
    expect(draft.cylinders).toEqual([
      { choice: 'unread', amount: null },
      { choice: 'part', amount: 35 },
    ]);
    expect(draftToFields(draft, ZONE)).toEqual({ ok: true, fields: record.checkIn });
  });
});

describe('re-forecast view', () => {
  const input = engineInputSchema.parse(DEMO_TRIPS.highlandLoop);
  const plan = simulateParsed(input);
  const at = plan.ledger[60]?.utc ?? '';
  const re = reforecastFrom(input, { at, socPct: 68, propane: [] });
  if (!re) throw new Error('no re-forecast');

  it('when a trip is re-forecast, then the headline names the check-in, its charge and the lowest ahead with weekdays', () => {
    const h = re.result.headline;
    expect(reforecastHeadline(re)).toBe(
      `From your check-in ${weekdayTime(re.fromLocal)} at 68 %: lowest ahead ${Math.round(h.lowestSocPct)} % on ${weekdayTime(h.lowestAtLocal)}`,
    );
    expect(weekdayTime('2027-09-14T18:00+01:00')).toBe('Tue 18:00');
  });

  it('when the chart is drawn, then the plan spans the trip, the forecast leaves from the reading and the readings sit at their hours', () => {
    const record = { id: 'c1', checkIn: { at, socPct: 68 } } as CheckInRecord;
    const chart = reforecastChart(toBudgetResult(plan), re, [record]);
    expect(chart.plan).toHaveLength(plan.ledger.length);
    expect(chart.ahead[0]).toEqual({ x: 60, soc: 68 });
    expect(chart.ahead).toHaveLength(plan.ledger.length - 60 + 1);
    expect(chart.readings).toEqual([{ id: 'c1', x: 60, soc: 68 }]);
  });
});

describe('stay longer or leave early', () => {
  const detail = demoDetail('highlandLoop');
  const plan = simulateParsed(engineInputSchema.parse(DEMO_TRIPS.highlandLoop));
  const forest = detail.stops[1];
  const inForest = {
    id: 'c1',
    checkIn: { at: forest?.stop.arriveAt ?? '', socPct: 90, propane: [], harvestWh: null, note: '' },
  } as unknown as CheckInRecord;

  it('when a check-in was taken at a stop, then that stop is the current one; with none and before the trip, the first', () => {
    expect(currentStopIndex(detail, [inForest], new Date('2026-12-03T12:00Z'))).toBe(1);
    expect(currentStopIndex(detail, [], new Date('2026-12-03T12:00Z'))).toBe(0);
  });

  it('when nothing changes, then the what-if is the plan itself', () => {
    const same = stayOutcome(detail, [], 1, 0, 'shift-rest');
    expect(same).toEqual({
      ok: true,
      lowestSocPct: plan.headline.lowestSocPct,
      lowestAtLocal: plan.headline.lowestAtLocal,
      fromCheckIn: false,
    });
  });

  it('when a night more is spent in the deep forest, then the lowest charge falls', () => {
    const longer = stayOutcome(detail, [], 1, 1, 'shift-rest');
    expect(longer.ok && longer.lowestSocPct).toBeLessThan(plan.headline.lowestSocPct);
  });

  it('when there is a check-in, then the what-if runs from it', () => {
    const fromReading = stayOutcome(detail, [inForest], 1, 1, 'shift-rest');
    expect(fromReading.ok && fromReading.fromCheckIn).toBe(true);
  });

  it('when more nights are taken than the stop has, then the what-if says which stop would be left with no time', () => {
    expect(stayOutcome(detail, [], 1, -5, 'shift-rest')).toEqual({
      ok: false,
      message: `That leaves no time at ${forest?.stop.name}: choose fewer nights.`,
    });
  });
});
