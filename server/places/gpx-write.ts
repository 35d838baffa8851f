// Writes a trip as GPX 1.1 (topografix.com/GPX/1/1): each stop a waypoint (time = arrival, in UTC as GPX asks),
// each drive a route from one stop to the next. Built as a DOM with @xmldom/xmldom so every name is escaped.
import { DOMImplementation, XMLSerializer, type Document, type Element } from '@xmldom/xmldom';
import { DateTime } from 'luxon';
import type { TripDetail } from '@/shared/schemas/api';

const GPX_NS = 'http://www.topografix.com/GPX/1/1';
const XSI_NS = 'http://www.w3.org/2001/XMLSchema-instance';

const utc = (iso: string) => new Date(iso).toISOString().replace(/\.\d{3}Z$/, 'Z');
const local = (iso: string, zone: string) => DateTime.fromISO(iso).setZone(zone).toFormat('ccc d LLL HH:mm');

function child(document: Document, parent: Element, name: string, text?: string): Element {
  const element = document.createElementNS(GPX_NS, name);
  if (text !== undefined) element.appendChild(document.createTextNode(text));
  parent.appendChild(element);
  return element;
}

function point(document: Document, parent: Element, name: 'wpt' | 'rtept', at: { lat: number; lon: number }) {
  const element = child(document, parent, name);
  element.setAttribute('lat', at.lat.toFixed(6));
  element.setAttribute('lon', at.lon.toFixed(6));
  return element;
}

export function tripToGpx(detail: Pick<TripDetail, 'trip' | 'stops' | 'drives'>, now: Date): string {
  const document = new DOMImplementation().createDocument(GPX_NS, 'gpx', null);
  const gpx = document.documentElement;
  if (!gpx) throw new Error('could not create a GPX document');
  gpx.setAttribute('version', '1.1');
  gpx.setAttribute('creator', 'Trailtally');
  gpx.setAttributeNS('http://www.w3.org/2000/xmlns/', 'xmlns:xsi', XSI_NS);
  gpx.setAttributeNS(XSI_NS, 'xsi:schemaLocation', `${GPX_NS} http://www.topografix.com/GPX/1/1/gpx.xsd`);

  // Children in the order the GPX 1.1 schema's sequences require.
  const metadata = child(document, gpx, 'metadata');
  child(document, metadata, 'name', detail.trip.name);
  child(document, metadata, 'desc', `${detail.trip.startDate} to ${detail.trip.endDate}, ${detail.stops.length} stops`);
  child(document, metadata, 'time', utc(now.toISOString()));

  for (const { stop } of detail.stops) {
    const wpt = point(document, gpx, 'wpt', stop);
    child(document, wpt, 'ele', String(stop.elevationM));
    child(document, wpt, 'time', utc(stop.arriveAt));
    child(document, wpt, 'name', stop.name);
    child(
      document,
      wpt,
      'desc',
      `Arrive ${local(stop.arriveAt, stop.timeZone)}, leave ${local(stop.departAt, stop.timeZone)} (${stop.timeZone})` +
        (stop.hookup ? `; hookup ${stop.hookup.amps} A at ${stop.hookup.volts} V` : '; no hookup'),
    );
    child(document, wpt, 'sym', 'Campground');
    child(document, wpt, 'type', 'stop');
  }

  detail.drives.forEach(({ drive }, i) => {
    const from = detail.stops[i]?.stop;
    const to = detail.stops[i + 1]?.stop;
    if (!from || !to) return;
    const rte = child(document, gpx, 'rte');
    child(document, rte, 'name', `Drive ${i + 1}: ${from.name} to ${to.name}`);
    const distance = drive.distanceKm === null || drive.distanceKm === undefined ? '' : `${drive.distanceKm} km, `;
    child(document, rte, 'desc', `${distance}${drive.hoursOnRoad} h on the road`);
    child(document, rte, 'number', String(i + 1));
    child(document, rte, 'type', 'drive');
    for (const end of [from, to]) child(document, point(document, rte, 'rtept', end), 'name', end.name);
  });

  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(document)}\n`;
}
