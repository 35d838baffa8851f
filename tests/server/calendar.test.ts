import ICAL from 'ical.js';
import { DateTime } from 'luxon';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { calendarFeeds } from '@/db/schema/calendar-feeds';
import { clubMembers, clubs, clubTrips } from '@/db/schema/clubs';
import { tripToCalendar } from '@/server/places/trip-calendar';
import { DEMO_TRIPS, simulateTrip } from '@/shared/engine';
import type { CalendarFeed } from '@/shared/schemas/calendar';
import { demoDetail } from '../e2e/fixtures';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, grant } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

type Event = { summary: string; start: Date; end: Date; description: string; uid: string };

function readCalendar(text: string): Event[] {
  const calendar = new ICAL.Component(ICAL.parse(text));
  return calendar.getAllSubcomponents('vevent').map((component) => {
    const event = new ICAL.Event(component);
    return {
      summary: event.summary,
      start: event.startDate.toJSDate(),
      end: event.endDate.toJSDate(),
      description: event.description,
      uid: event.uid,
    };
  });
}

const london = (date: Date) => DateTime.fromJSDate(date).setZone('Europe/London').toFormat('yyyy-MM-dd HH:mm');

/** A trip across the night British clocks go back (31 October 2027, 02:00 BST → 01:00 GMT). */
async function autumnTrip() {
  const owner = await signUpAgent(ctx.app);
  const { trip } = await createTrip(owner.agent, { startDate: '2027-10-29', endDate: '2027-11-03' });
  const base = { timeZone: 'Europe/London', lowC: 4, highC: 11 };
  await addStop(owner.agent, trip.id, {
    ...base,
    name: 'Loch Eil shore',
    lat: 56.85,
    lon: -5.2,
    arriveAt: '2027-10-29T15:00+01:00',
    departAt: '2027-10-31T10:00+00:00',
  });
  await addStop(owner.agent, trip.id, {
    ...base,
    name: 'Glen Nevis pinewood',
    lat: 56.8,
    lon: -5.07,
    arriveAt: '2027-10-31T15:00+00:00',
    departAt: '2027-11-02T10:00+00:00',
  });
  await addAppliance(owner.agent, trip.id);
  return { owner, tripId: trip.id };
}

describe('the trip as a calendar file', () => {
  it('when downloaded, then each stop is an event at the right local times on both sides of a clock change', async () => {
    const { owner, tripId } = await autumnTrip();
    const response = await owner.agent.get(`/api/trips/${tripId}/calendar.ics`);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toContain('text/calendar');
    expect(response.headers['content-disposition']).toContain('.ics');
    const events = readCalendar(response.text);
    const loch = events.find((e) => e.summary === '1. Loch Eil shore');
    const glen = events.find((e) => e.summary === '2. Glen Nevis pinewood');
    // Before the change British time is UTC+1, after it UTC+0: the same 15:00 arrival is an hour apart in UTC.
    expect(london(loch?.start ?? new Date(0))).toBe('2027-10-29 15:00');
    expect(loch?.start.toISOString()).toBe('2027-10-29T14:00:00.000Z');
    expect(london(loch?.end ?? new Date(0))).toBe('2027-10-31 10:00');
    expect(london(glen?.start ?? new Date(0))).toBe('2027-10-31 15:00');
    expect(glen?.start.toISOString()).toBe('2027-10-31T15:00:00.000Z');
    expect(london(glen?.end ?? new Date(0))).toBe('2027-11-02 10:00');
  });

  it('when a stop has a budget, then its description gives each day in one line with the lowest charge and flags', async () => {
    const { owner, tripId } = await autumnTrip();
    const events = readCalendar((await owner.agent.get(`/api/trips/${tripId}/calendar.ics`)).text);
    const loch = events.find((e) => e.summary.includes('Loch Eil'));
    const lines = (loch?.description ?? '').split('\n');
    expect(lines[0]).toMatch(/^Fri 29 Oct: lowest charge \d+ %, (no flags|\d+ flags? \(.+\))$/);
    expect(lines.filter((line) => /lowest charge/.test(line))).toHaveLength(3);
    const drive = events.find((e) => e.summary.startsWith('Drive:'));
    expect(drive?.summary).toBe('Drive: Loch Eil shore to Glen Nevis pinewood');
    expect(drive?.start.toISOString()).toBe('2027-10-31T10:00:00.000Z');
  });

  it('when the generator runs, then each run is its own event with the carbon monoxide caution', () => {
    const detail = demoDetail('desertSpringLoop');
    const result = simulateTrip(DEMO_TRIPS.desertSpringLoop);
    const events = readCalendar(tripToCalendar(detail, result, 'http://localhost:8080'));
    const runs = events.filter((e) => e.summary.startsWith('Generator'));
    expect(runs.length).toBeGreaterThan(0);
    const hours = runs.reduce((h, e) => h + (e.end.getTime() - e.start.getTime()) / 3_600_000, 0);
    // The ledger steps the generator in quarter hours and charges whole steps: the events cover every step it ran.
    const stepsOn = result.ledger.filter((row) => row.generatorH > 0).reduce((h, row) => h + row.stepH, 0);
    expect(hours).toBeCloseTo(stepsOn, 6);
    expect(runs.every((e) => /carbon monoxide|CO alarm/.test(e.description))).toBe(true);
  });
});

describe('calendar subscription addresses', () => {
  it('when a member makes one, then the address works without a session and the server keeps only a hash', async () => {
    const { owner, tripId } = await autumnTrip();
    const response = await owner.agent
      .post(`/api/trips/${tripId}/calendar-feeds`)
      .set('Origin', 'http://localhost:8080');
    expect(response.status).toBe(201);
    const feed = response.body as CalendarFeed;
    expect(feed.url).toMatch(/^http:\/\/localhost:8080\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    expect(feed.webcalUrl).toMatch(/^webcal:\/\/localhost:8080\//);
    const path = new URL(feed.url ?? '').pathname;
    const fetched = await request(ctx.app).get(path);
    expect(fetched.status).toBe(200);
    expect(readCalendar(fetched.text).some((e) => e.summary.includes('Glen Nevis'))).toBe(true);
    const token = path.split('/').pop()?.replace('.ics', '') ?? '';
    const stored = ctx.db.select().from(calendarFeeds).all();
    expect(stored).toHaveLength(1);
    expect(JSON.stringify(stored)).not.toContain(token);
    const list = await owner.agent.get(`/api/trips/${tripId}/calendar-feeds`);
    expect(list.body.feeds).toHaveLength(1);
    expect(list.body.feeds[0].url).toBeUndefined();
    expect(list.body.feeds[0].lastFetchedAt).not.toBeNull();
  });

  it('when the address is revoked, then it stops working at once', async () => {
    const { owner, tripId } = await autumnTrip();
    const feed = (await owner.agent.post(`/api/trips/${tripId}/calendar-feeds`)).body as CalendarFeed;
    await owner.agent.delete(`/api/trips/${tripId}/calendar-feeds/${feed.id}`).expect(204);
    const fetched = await request(ctx.app).get(new URL(feed.url ?? '').pathname);
    expect(fetched.status).toBe(404);
    expect(fetched.body.error.message).toContain('does not work any more');
  });

  it('when its member leaves the trip, then the address stops working', async () => {
    const { owner, tripId } = await autumnTrip();
    const crew = await signUpAgent(ctx.app);
    grant(ctx.db, tripId, crew.userId, 'viewer');
    const feed = (await crew.agent.post(`/api/trips/${tripId}/calendar-feeds`).expect(201)).body as CalendarFeed;
    const path = new URL(feed.url ?? '').pathname;
    await request(ctx.app).get(path).expect(200);
    await owner.agent.delete(`/api/trips/${tripId}/members/${crew.userId}`).expect(204);
    expect((await request(ctx.app).get(path)).status).toBe(404);
  });

  it('when a token is altered or made up, then it answers 404', async () => {
    const { owner, tripId } = await autumnTrip();
    const feed = (await owner.agent.post(`/api/trips/${tripId}/calendar-feeds`)).body as CalendarFeed;
    const path = new URL(feed.url ?? '').pathname;
    const altered = path.replace(/[A-Za-z](?=[^/]*\.ics$)/, (c) => (c === 'a' ? 'b' : 'a'));
    expect((await request(ctx.app).get(altered)).status).toBe(404);
    expect((await request(ctx.app).get('/api/calendar/not-a-token')).status).toBe(404);
  });

  it('when someone only sees the trip through a club, then they cannot make an address', async () => {
    const { tripId } = await autumnTrip();
    const clubMember = await signUpAgent(ctx.app);
    const at = new Date('2026-11-20T10:00:00Z');
    ctx.db.insert(clubs).values({ id: 'club-1', name: 'Glen club', createdAt: at }).run();
    ctx.db
      .insert(clubMembers)
      .values({ clubId: 'club-1', userId: clubMember.userId, role: 'member', joinedAt: at })
      .run();
    ctx.db.insert(clubTrips).values({ clubId: 'club-1', tripId, sharedAt: at }).run();
    expect((await clubMember.agent.get(`/api/trips/${tripId}/calendar.ics`)).status).toBe(200);
    const refused = await clubMember.agent.post(`/api/trips/${tripId}/calendar-feeds`);
    expect(refused.status).toBe(403);
    const stranger = await signUpAgent(ctx.app);
    expect((await stranger.agent.post(`/api/trips/${tripId}/calendar-feeds`)).status).toBe(404);
  });

  it('when someone else’s address is revoked by another member, then it answers 404 and keeps working', async () => {
    const { owner, tripId } = await autumnTrip();
    const feed = (await owner.agent.post(`/api/trips/${tripId}/calendar-feeds`)).body as CalendarFeed;
    const planner = await signUpAgent(ctx.app);
    grant(ctx.db, tripId, planner.userId, 'planner');
    expect((await planner.agent.delete(`/api/trips/${tripId}/calendar-feeds/${feed.id}`)).status).toBe(404);
    expect((await request(ctx.app).get(new URL(feed.url ?? '').pathname)).status).toBe(200);
  });

  it('when a member already has five addresses, then a sixth is refused with a message', async () => {
    const { owner, tripId } = await autumnTrip();
    for (let i = 0; i < 5; i += 1) await owner.agent.post(`/api/trips/${tripId}/calendar-feeds`).expect(201);
    const sixth = await owner.agent.post(`/api/trips/${tripId}/calendar-feeds`);
    expect(sixth.status).toBe(422);
    expect(sixth.body.error.message).toContain('5 calendar addresses');
  });
});
