import fs from 'node:fs';
import path from 'node:path';
import { DOMParser, type Element } from '@xmldom/xmldom';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { grant } from '../factories/trip-factory';
import { closeGpxPool } from '@/server/places/gpx-pool';
import { GPX_MAX_TRACK_POINTS, readGpx } from '@/server/places/gpx-read';
import type { TripDetail } from '@/shared/schemas/api';
import type { GpxPreview } from '@/shared/schemas/gpx';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addStop, createTrip, getDetail, stopOnNextFreeDay } from '../factories/trip-factory';

const FIXTURE = fs.readFileSync(path.join(__dirname, '..', 'fixtures', 'gpx', 'four-waypoints-track.gpx'), 'utf8');

// The haversine written out here on its own, with CHECK-VALUES §11's mean Earth radius (6,371.0088 km,
// Moritz 2000), so the import's distances are checked against arithmetic the app's code did not do.
const R = 6371.0088;
function haversineKm([lat1 = 0, lon1 = 0]: number[], [lat2 = 0, lon2 = 0]: number[]): number {
  const rad = Math.PI / 180;
  const h =
    Math.sin(((lat2 - lat1) * rad) / 2) ** 2 +
    Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(((lon2 - lon1) * rad) / 2) ** 2;
  return 2 * R * Math.asin(Math.sqrt(h));
}
const lengthKm = (points: number[][]) => points.slice(1).reduce((km, p, i) => km + haversineKm(points[i] ?? p, p), 0);

const LEG_1 = [
  [57.0, -5.0],
  [56.0, -4.0],
];
const LEG_2 = [
  [56.0, -4.0],
  [56.1, -3.9],
  [56.2, -3.7],
  [56.3, -3.6],
];
const LEG_3 = [
  [56.3, -3.6],
  [56.4, -3.4],
  [56.5, -3.2],
];

let ctx: TestContext;
let owner: Awaited<ReturnType<typeof signUpAgent>>;
beforeAll(async () => {
  ctx = createTestApp();
  owner = await signUpAgent(ctx.app);
});
afterAll(async () => {
  ctx.close();
  await closeGpxPool();
});

const weekTrip = async () =>
  (await createTrip(owner.agent, { startDate: '2027-06-01', endDate: '2027-06-08' })) as TripDetail;

const post = (url: string, body: string, type = 'application/gpx+xml') =>
  owner.agent.post(url).set('Content-Type', type).send(body);

describe('GPX import', () => {
  it('checks its own haversine against CHECK-VALUES §11 first', () => {
    expect(haversineKm([0, 0], [0, 1])).toBeCloseTo(111.1951, 4);
    expect(haversineKm([57, -5], [56, -4])).toBeCloseTo(127.0045, 4);
    expect(haversineKm([36.12, -115.17], [34.05, -118.24])).toBeCloseTo(361.918, 3);
  });

  it('when a file with 4 waypoints and a track is previewed, then it lists 4 stops and 3 drives measured along the track, and saves nothing', async () => {
    const { trip } = await weekTrip();
    const response = await post(`/api/trips/${trip.id}/gpx/preview`, FIXTURE);
    expect(response.status).toBe(200);
    const preview = response.body as GpxPreview;
    expect(preview.stops.map((s) => s.stop.name)).toEqual([
      'Lochan Dubh pitch',
      'Creag Ruadh field',
      'Allt Beag pinewood',
      'Port na Sgeir & shore',
    ]);
    expect(preview.stops.every((s) => s.stop.timeZone === 'Europe/London')).toBe(true);
    expect(preview.stops.map((s) => s.stop.elevationM)).toEqual([12, 40, 210, 5]);
    expect(preview).toMatchObject({ timing: 'spread', lineKind: 'track', replaces: 0, name: 'Glen and shore loop' });
    // Distances are kept to 0.1 km.
    const km = preview.drives.map((d) => d.distanceKm ?? NaN);
    expect(km[0]).toBeCloseTo(127.0045, 1);
    expect(km[0]).toBeCloseTo(lengthKm(LEG_1), 1);
    expect(km[1]).toBeCloseTo(lengthKm(LEG_2), 1);
    expect(km[2]).toBeCloseTo(lengthKm(LEG_3), 1);
    expect(preview.lineKm).toBeCloseTo(lengthKm([...LEG_1, ...LEG_2.slice(1), ...LEG_3.slice(1)]), 1);
    expect(preview.drives.every((d) => d.distanceSource === 'track')).toBe(true);
    // 7 nights over 4 stops: 2, 2, 2 and 1, arriving mid-afternoon and leaving mid-morning.
    expect(preview.stops.map((s) => [s.stop.arriveAt, s.stop.departAt])).toEqual([
      ['2027-06-01T15:00+01:00', '2027-06-03T10:00+01:00'],
      ['2027-06-03T15:00+01:00', '2027-06-05T10:00+01:00'],
      ['2027-06-05T15:00+01:00', '2027-06-07T10:00+01:00'],
      ['2027-06-07T15:00+01:00', '2027-06-08T10:00+01:00'],
    ]);
    expect((await getDetail(owner.agent, trip.id)).stops).toHaveLength(0);
  });

  it('when the file is imported, then the stops and drives are saved in one go with the track distances', async () => {
    const { trip } = await weekTrip();
    const response = await post(`/api/trips/${trip.id}/gpx/import?tripVersion=${trip.version}`, FIXTURE);
    expect(response.status).toBe(200);
    const detail = response.body as TripDetail;
    expect(detail.stops).toHaveLength(4);
    expect(detail.drives).toHaveLength(3);
    expect(detail.drives[0]?.drive.distanceKm).toBeCloseTo(lengthKm(LEG_1), 1);
    expect(detail.drives[1]?.drive.distanceKm).toBeCloseTo(lengthKm(LEG_2), 1);
    expect(detail.drives[2]?.drive.distanceKm).toBeCloseTo(lengthKm(LEG_3), 1);
    // No times in the track: the time on the road is the suggestion at 70 km/h, to the quarter hour.
    expect(detail.drives[0]?.drive).toMatchObject({ hoursSource: 'suggested', hoursOnRoad: 1.75 });
    expect(detail.trip.version).toBe(trip.version + 1);
    const activity = await owner.agent.get(`/api/trips/${trip.id}/activity`);
    expect(activity.body.entries[0].summary).toBe('imported 4 stops from a GPX file');
  });

  it('when the route already has stops, then the import asks to replace them, and replaces them when confirmed', async () => {
    const { trip } = await weekTrip();
    await addStop(owner.agent, trip.id, {
      ...stopOnNextFreeDay('Old pitch'),
      arriveAt: '2027-06-02T14:00+01:00',
      departAt: '2027-06-03T10:00+01:00',
    });
    const current = await getDetail(owner.agent, trip.id);
    const preview = await post(`/api/trips/${trip.id}/gpx/preview`, FIXTURE);
    expect((preview.body as GpxPreview).replaces).toBe(1);
    const refused = await post(`/api/trips/${trip.id}/gpx/import?tripVersion=${current.trip.version}`, FIXTURE);
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields.replace).toBeDefined();
    const done = await post(
      `/api/trips/${trip.id}/gpx/import?tripVersion=${current.trip.version}&replace=true`,
      FIXTURE,
    );
    expect(done.status).toBe(200);
    expect((done.body as TripDetail).stops.map((s) => s.stop.name)).not.toContain('Old pitch');
  });

  it('when the trip changed since the preview, then the import answers 409 and saves nothing', async () => {
    const { trip } = await weekTrip();
    const response = await post(`/api/trips/${trip.id}/gpx/import?tripVersion=${trip.version + 5}`, FIXTURE);
    expect(response.status).toBe(409);
    expect((await getDetail(owner.agent, trip.id)).stops).toHaveLength(0);
  });

  it('when one waypoint cannot fit the trip, then nothing at all is saved', async () => {
    const { trip } = await weekTrip();
    await addStop(owner.agent, trip.id, {
      ...stopOnNextFreeDay('Kept pitch'),
      arriveAt: '2027-06-02T14:00+01:00',
      departAt: '2027-06-03T10:00+01:00',
    });
    const before = await getDetail(owner.agent, trip.id);
    const timed = FIXTURE.replace(
      '<name>Lochan Dubh pitch</name>',
      '<time>2027-06-01T14:00:00Z</time><name>Lochan Dubh pitch</name>',
    )
      .replace('<name>Creag Ruadh field</name>', '<time>2027-06-03T14:00:00Z</time><name>Creag Ruadh field</name>')
      .replace('<name>Allt Beag pinewood</name>', '<time>2027-06-05T14:00:00Z</time><name>Allt Beag pinewood</name>')
      .replace(
        '<name>Port na Sgeir &amp; shore</name>',
        '<time>2027-06-20T14:00:00Z</time><name>Port na Sgeir &amp; shore</name>',
      );
    const response = await post(
      `/api/trips/${trip.id}/gpx/import?tripVersion=${before.trip.version}&replace=true`,
      timed,
    );
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/does not fit the trip: Departure is after the trip ends/);
    const after = await getDetail(owner.agent, trip.id);
    expect(after.stops.map((s) => s.stop.name)).toEqual(before.stops.map((s) => s.stop.name));
  });

  it('when the waypoints and the track carry times, then arrivals come from the file and drive hours from the moving time', async () => {
    const { trip } = await weekTrip();
    const file = `<?xml version="1.0"?><gpx version="1.1" creator="test" xmlns="http://www.topografix.com/GPX/1/1">
      <wpt lat="57.0" lon="-5.0"><time>2027-06-01T13:00:00Z</time><name>A</name></wpt>
      <wpt lat="56.0" lon="-4.0"><time>2027-06-03T14:30:00Z</time><name>B</name></wpt>
      <trk><trkseg>
        <trkpt lat="57.0" lon="-5.0"><time>2027-06-03T10:00:00Z</time></trkpt>
        <trkpt lat="56.5" lon="-4.5"><time>2027-06-03T11:00:00Z</time></trkpt>
        <trkpt lat="56.5" lon="-4.5"><time>2027-06-03T11:30:00Z</time></trkpt>
        <trkpt lat="56.0" lon="-4.0"><time>2027-06-03T12:30:00Z</time></trkpt>
      </trkseg></trk></gpx>`;
    const response = await post(`/api/trips/${trip.id}/gpx/preview`, file);
    expect(response.status).toBe(200);
    const preview = response.body as GpxPreview;
    expect(preview.timing).toBe('from-file');
    expect(preview.stops[0]?.stop.arriveAt).toBe('2027-06-01T14:00+01:00');
    expect(preview.stops[1]?.stop.arriveAt).toBe('2027-06-03T15:30+01:00');
    // Two hours moving; the half hour parked at the same point is not driving.
    expect(preview.drives[0]).toMatchObject({ hoursOnRoad: 2, hoursSource: 'typed' });
    expect(preview.stops[0]?.stop.departAt).toBe('2027-06-03T13:30+01:00');
    // The last stop stays until late morning on the trip's last day.
    expect(preview.stops[1]?.stop.departAt).toBe('2027-06-08T11:00+01:00');
  });

  it.each([
    ['an empty file', '', 'empty'],
    ['text that is not XML', 'waypoint 1: 57, -5', 'not readable XML'],
    ['XML that is not GPX', '<?xml version="1.0"?><kml><Placemark/></kml>', 'not GPX'],
    [
      'a document type with entities',
      '<?xml version="1.0"?><!DOCTYPE gpx [<!ENTITY a "aaaa">]><gpx version="1.1"><wpt lat="1" lon="1"><name>&a;</name></wpt></gpx>',
      'document type',
    ],
    [
      'a track with no waypoints',
      '<gpx version="1.1" xmlns="http://www.topografix.com/GPX/1/1"><trk><trkseg><trkpt lat="1" lon="1"/></trkseg></trk></gpx>',
      'no waypoints',
    ],
    [
      'more waypoints than a trip holds',
      `<gpx version="1.1">${Array.from({ length: 61 }, (_, i) => `<wpt lat="56" lon="${-5 + i / 100}"/>`).join('')}</gpx>`,
      'at most 60',
    ],
    [
      'more places than the trip has nights',
      `<gpx version="1.1">${Array.from({ length: 9 }, (_, i) => `<wpt lat="56" lon="${-5 + i / 10}"/>`).join('')}</gpx>`,
      '7 nights',
    ],
  ])('when given %s, then it answers 422 saying what was wrong', async (_what, body, words) => {
    const { trip } = await weekTrip();
    const response = await post(`/api/trips/${trip.id}/gpx/preview`, body, 'text/xml');
    expect(response.status).toBe(422);
    expect(response.body.error.message).toContain(words);
    expect(response.body.error.fields.file).toBeDefined();
  });

  it('when the file is over 5 MB, then it answers 413 saying so', async () => {
    const { trip } = await weekTrip();
    const response = await post(`/api/trips/${trip.id}/gpx/preview`, `<gpx>${' '.repeat(5 * 1024 * 1024)}</gpx>`);
    expect(response.status).toBe(413);
    expect(response.body.error.message).toContain('over 5 MB');
  });

  it('when the file is sent as JSON, then it answers 415 asking for the file itself', async () => {
    const { trip } = await weekTrip();
    const response = await owner.agent.post(`/api/trips/${trip.id}/gpx/preview`).send({ gpx: FIXTURE });
    expect(response.status).toBe(415);
  });

  it('when a file holds more track points than can be read, then it is refused before it is converted', () => {
    const points = '<trkpt lat="1" lon="1"/>'.repeat(GPX_MAX_TRACK_POINTS + 1);
    expect(() =>
      readGpx(`<gpx version="1.1"><wpt lat="1" lon="1"/><trk><trkseg>${points}</trkseg></trk></gpx>`),
    ).toThrow(/track points/);
  });

  it('when crew or a viewer try to import, then it answers 403; a viewer may still export', async () => {
    const { trip } = await weekTrip();
    const crew = await signUpAgent(ctx.app);
    grant(ctx.db, trip.id, crew.userId, 'crew');
    const response = await crew.agent
      .post(`/api/trips/${trip.id}/gpx/preview`)
      .set('Content-Type', 'application/gpx+xml')
      .send(FIXTURE);
    expect(response.status).toBe(403);
    const viewer = await signUpAgent(ctx.app);
    grant(ctx.db, trip.id, viewer.userId, 'viewer');
    expect((await viewer.agent.get(`/api/trips/${trip.id}/export.gpx`)).status).toBe(200);
  });
});

// Element order of the GPX 1.1 schema's sequences (topografix.com/GPX/1/1/gpx.xsd).
const SEQUENCES: Record<string, string[]> = {
  gpx: ['metadata', 'wpt', 'rte', 'trk', 'extensions'],
  metadata: ['name', 'desc', 'author', 'copyright', 'link', 'time', 'keywords', 'bounds', 'extensions'],
  wpt: [
    'ele',
    'time',
    'magvar',
    'geoidheight',
    'name',
    'cmt',
    'desc',
    'src',
    'link',
    'sym',
    'type',
    'fix',
    'sat',
    'hdop',
    'vdop',
    'pdop',
    'ageofdgpsdata',
    'dgpsid',
    'extensions',
  ],
  rte: ['name', 'cmt', 'desc', 'src', 'link', 'number', 'type', 'extensions', 'rtept'],
};
SEQUENCES.rtept = SEQUENCES.wpt ?? [];
const ONCE = new Set(['metadata', 'name', 'desc', 'time', 'ele', 'number', 'type', 'sym', 'extensions']);
const DATE_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?Z$/;

/** Fails with the path of the first element out of the GPX 1.1 schema's structure. */
function checkGpx11(element: Element, where = 'gpx'): void {
  const order = SEQUENCES[element.localName ?? ''];
  const children = Array.from(element.childNodes).filter((n): n is Element => n.nodeType === 1);
  if (order) {
    let last = -1;
    const seen = new Set<string>();
    for (const child of children) {
      const name = child.localName ?? '';
      const at = order.indexOf(name);
      expect(at, `${where}/${name} is not allowed here`).toBeGreaterThanOrEqual(0);
      expect(at, `${where}/${name} is out of order`).toBeGreaterThanOrEqual(last);
      if (ONCE.has(name)) expect(seen.has(name), `${where}/${name} appears twice`).toBe(false);
      seen.add(name);
      last = at;
      checkGpx11(child, `${where}/${name}`);
    }
  }
  if (element.localName === 'wpt' || element.localName === 'rtept') {
    const lat = Number(element.getAttribute('lat'));
    const lon = Number(element.getAttribute('lon'));
    expect(lat >= -90 && lat <= 90, `${where} latitude`).toBe(true);
    expect(lon >= -180 && lon < 180, `${where} longitude`).toBe(true);
  }
  if (element.localName === 'time') expect(element.textContent ?? '').toMatch(DATE_TIME);
  if (element.localName === 'ele') expect(Number.isFinite(Number(element.textContent))).toBe(true);
  if (element.localName === 'number') expect(element.textContent ?? '').toMatch(/^\d+$/);
}

describe('GPX export', () => {
  it('when a trip is exported, then the file has GPX 1.1 structure: stops as waypoints, drives as routes', async () => {
    const { trip } = await weekTrip();
    await post(`/api/trips/${trip.id}/gpx/import?tripVersion=${trip.version}`, FIXTURE).expect(200);
    const response = await owner.agent.get(`/api/trips/${trip.id}/export.gpx`);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toContain('application/gpx+xml');
    expect(response.headers['content-disposition']).toContain('.gpx');
    const document = new DOMParser().parseFromString(response.text, 'application/xml');
    const root = document.documentElement;
    if (!root) throw new Error('no root');
    expect(root.localName).toBe('gpx');
    expect(root.namespaceURI).toBe('http://www.topografix.com/GPX/1/1');
    expect(root.getAttribute('version')).toBe('1.1');
    expect(root.getAttribute('creator')).toBe('Trailtally');
    checkGpx11(root);
    expect(document.getElementsByTagName('wpt')).toHaveLength(4);
    expect(document.getElementsByTagName('rte')).toHaveLength(3);
    expect(document.getElementsByTagName('wpt')[3]?.getElementsByTagName('name')[0]?.textContent).toBe(
      'Port na Sgeir & shore',
    );
  });

  it('when the exported file is read back, then it gives the same places and arrival times', async () => {
    const { trip } = await weekTrip();
    const imported = (await post(`/api/trips/${trip.id}/gpx/import?tripVersion=${trip.version}`, FIXTURE))
      .body as TripDetail;
    const exported = await owner.agent.get(`/api/trips/${trip.id}/export.gpx`);
    const again = readGpx(exported.text);
    expect(again.waypoints.map((w) => [w.name, w.lat, w.lon])).toEqual(
      imported.stops.map((s) => [s.stop.name, s.stop.lat, s.stop.lon]),
    );
    expect(again.waypoints.map((w) => w.time)).toEqual(
      imported.stops.map((s) => new Date(s.stop.arriveAt).toISOString()),
    );
    expect(again.lineKind).toBe('route');
  });
});
