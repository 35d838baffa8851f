// The map's background: Natural Earth countries (world-atlas TopoJSON, public domain) cut to a trip's extent on
// the server, so a phone draws a few thousand points of coastline instead of parsing a 3 MB world. The finest
// scale (1:10m) is used for a region, 1:50m for a country, 1:110m for a continent.
import { createRequire } from 'node:module';
import { geoClipRectangle, type GeoStream } from 'd3-geo';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, GeometryObject, Topology } from 'topojson-specification';
import type { Basemap, BasemapDetail, BasemapQuery } from '@/shared/schemas/places';

type Box = [number, number, number, number];
/** One polygon of a country (France's mainland, one of its islands…) with its own box, so a far-flung part
 * does not drag the whole country into every map. */
type Part = { arcs: number[][]; box: Box; country: number };
type Atlas = { topology: Topology; countries: GeometryObject[]; parts: Part[] };

const atlases = new Map<BasemapDetail, Atlas>();

/** Bounding box of each arc, from the quantized, delta-encoded topology, without building any GeoJSON. */
function arcBoxes(topology: Topology): Box[] {
  const [sx, sy] = topology.transform?.scale ?? [1, 1];
  const [tx, ty] = topology.transform?.translate ?? [0, 0];
  return topology.arcs.map((arc) => {
    let x = 0;
    let y = 0;
    const box: Box = [Infinity, Infinity, -Infinity, -Infinity];
    for (const position of arc) {
      const [dx = 0, dy = 0] = position;
      x = topology.transform ? x + dx : dx;
      y = topology.transform ? y + dy : dy;
      const lon = x * sx + tx;
      const lat = y * sy + ty;
      box[0] = Math.min(box[0], lon);
      box[1] = Math.min(box[1], lat);
      box[2] = Math.max(box[2], lon);
      box[3] = Math.max(box[3], lat);
    }
    return box;
  });
}

function polygonsOf(geometry: GeometryObject): number[][][] {
  if (geometry.type === 'Polygon') return [geometry.arcs];
  if (geometry.type === 'MultiPolygon') return geometry.arcs;
  return [];
}

function loadAtlas(detail: BasemapDetail): Atlas {
  const known = atlases.get(detail);
  if (known) return known;
  const load = createRequire(__filename);
  const topology = load(`world-atlas/countries-${detail}.json`) as Topology;
  const arcs = arcBoxes(topology);
  const countries = (topology.objects.countries as GeometryCollection).geometries;
  const parts = countries.flatMap((geometry, country) =>
    polygonsOf(geometry).map((polygon) => ({
      arcs: polygon,
      country,
      box: polygon.flat().reduce<Box>(
        (box, index) => {
          const arc = arcs[index < 0 ? ~index : index];
          return arc
            ? [Math.min(box[0], arc[0]), Math.min(box[1], arc[1]), Math.max(box[2], arc[2]), Math.max(box[3], arc[3])]
            : box;
        },
        [Infinity, Infinity, -Infinity, -Infinity],
      ),
    })),
  );
  const atlas = { topology, countries, parts };
  atlases.set(detail, atlas);
  return atlas;
}

/** Loads the three scales now, so the first map drawn does not wait for them (about two seconds). */
export function warmBasemap(): void {
  for (const detail of ['110m', '50m', '10m'] as const) loadAtlas(detail);
}

export function detailFor(box: BasemapQuery): BasemapDetail {
  const span = Math.max(box.east - box.west, box.north - box.south);
  return span <= 8 ? '10m' : span <= 40 ? '50m' : '110m';
}

const round = (v: number) => Math.round(v * 1e4) / 1e4;

/** Collects what d3's rectangle clip emits: closed rings for polygons, runs of points for lines. */
function collector(out: [number, number][][], closeRings: boolean): GeoStream {
  let current: [number, number][] = [];
  return {
    point: (x, y) => void current.push([round(x), round(y)]),
    lineStart: () => void (current = []),
    lineEnd: () => {
      const first = current[0];
      if (closeRings && first) current.push(first);
      if (current.length >= 2) out.push(current);
    },
    polygonStart: () => undefined,
    polygonEnd: () => undefined,
    sphere: () => undefined,
  };
}

function clipRings(polygons: number[][][][], box: Box): [number, number][][] {
  const out: [number, number][][] = [];
  const clip = geoClipRectangle(box[0], box[1], box[2], box[3])(collector(out, true));
  for (const polygon of polygons) {
    clip.polygonStart?.();
    for (const ring of polygon) {
      clip.lineStart();
      // Streams take rings without the closing point repeated.
      for (const [x = 0, y = 0] of ring.slice(0, -1)) clip.point(x, y);
      clip.lineEnd();
    }
    clip.polygonEnd?.();
  }
  return out;
}

function clipLines(lines: number[][][], box: Box): [number, number][][] {
  const out: [number, number][][] = [];
  const clip = geoClipRectangle(box[0], box[1], box[2], box[3])(collector(out, false));
  for (const line of lines) {
    clip.lineStart();
    for (const [x = 0, y = 0] of line) clip.point(x, y);
    clip.lineEnd();
  }
  return out;
}

const cache = new Map<string, Basemap>();
const CACHE_LIMIT = 64;

/** Land and country borders inside the box, at the scale that suits its size. */
export function basemapFor(query: BasemapQuery): Basemap {
  const box: Box = [query.west, query.south, query.east, query.north];
  const detail = detailFor(query);
  const key = `${detail}:${box.join(',')}`;
  const cached = cache.get(key);
  if (cached) return cached;
  const atlas = loadAtlas(detail);
  const overlaps = (b: Box) => b[0] <= box[2] && b[2] >= box[0] && b[1] <= box[3] && b[3] >= box[1];
  const parts = atlas.parts.filter((part) => overlaps(part.box));
  const land: GeometryCollection = {
    type: 'GeometryCollection',
    geometries: parts.map((part) => ({ type: 'Polygon', arcs: part.arcs })),
  };
  const polygons = feature(atlas.topology, land).features.flatMap((f) =>
    f.geometry.type === 'Polygon' ? [f.geometry.coordinates] : [],
  );
  const countries: GeometryCollection = {
    type: 'GeometryCollection',
    geometries: [...new Set(parts.map((part) => part.country))].flatMap((i) => atlas.countries[i] ?? []),
  };
  const borders = mesh(atlas.topology, countries, (a, b) => a !== b).coordinates;
  const answer: Basemap = { detail, bbox: box, land: clipRings(polygons, box), borders: clipLines(borders, box) };
  if (cache.size >= CACHE_LIMIT) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  cache.set(key, answer);
  return answer;
}
