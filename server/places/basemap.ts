// The map's background: Natural Earth countries (world-atlas TopoJSON, public domain) cut to a trip's extent on
// the server, so a phone draws a few thousand points of coastline instead of parsing a 3 MB world. The finest
// scale (1:10m) is used for a region, 1:50m for a country, 1:110m for a continent.
import fs from 'node:fs';
import { createRequire } from 'node:module';
import { geoClipRectangle, type GeoStream } from 'd3-geo';
import { feature, mesh } from 'topojson-client';
import type { GeometryCollection, GeometryObject, Topology } from 'topojson-specification';
import type { Basemap, BasemapDetail, BasemapQuery } from '@/shared/schemas/places';

type Box = [number, number, number, number];
/** One polygon of a country (France's mainland, one of its islands…) with its own box, so a far-flung part
 * does not drag the whole country into every map. */
type Part = { arcs: number[][]; box: Box; country: number };
/**
 * Every arc's quantized, delta-encoded points in one typed array: arc i's x and y pairs are
 * `points[2 * starts[i]] … points[2 * starts[i + 1] - 1]`. The 1:10m world is about 480 000 points, which as
 * nested arrays cost some 40 MB of heap; packed they are under 4 MB.
 */
type PackedArcs = { points: Int32Array; starts: Uint32Array };
type Atlas = { topology: Omit<Topology, 'arcs'>; arcs: PackedArcs; countries: GeometryObject[]; parts: Part[] };

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

function packArcs(arcs: Topology['arcs']): PackedArcs {
  const starts = new Uint32Array(arcs.length + 1);
  arcs.forEach((arc, i) => (starts[i + 1] = (starts[i] ?? 0) + arc.length));
  const points = new Int32Array(2 * (starts[arcs.length] ?? 0));
  arcs.forEach((arc, i) => {
    let at = 2 * (starts[i] ?? 0);
    for (const [x = 0, y = 0] of arc) {
      if (!Number.isInteger(x) || !Number.isInteger(y)) throw new Error('The world atlas is expected to be quantized.');
      points[at++] = x;
      points[at++] = y;
    }
  });
  return { points, starts };
}

/** The arcs a map needs, as topojson-client reads them; the others are left as holes it never visits. */
function unpackArcs(packed: PackedArcs, wanted: Iterable<number>): Topology['arcs'] {
  const arcs: Topology['arcs'] = new Array<Topology['arcs'][number]>(packed.starts.length - 1);
  for (const reference of wanted) {
    const i = reference < 0 ? ~reference : reference;
    if (arcs[i]) continue;
    const arc: [number, number][] = [];
    for (let at = 2 * (packed.starts[i] ?? 0); at < 2 * (packed.starts[i + 1] ?? 0); at += 2)
      arc.push([packed.points[at] ?? 0, packed.points[at + 1] ?? 0]);
    arcs[i] = arc;
  }
  return arcs;
}

function polygonsOf(geometry: GeometryObject): number[][][] {
  if (geometry.type === 'Polygon') return [geometry.arcs];
  if (geometry.type === 'MultiPolygon') return geometry.arcs;
  return [];
}

function loadAtlas(detail: BasemapDetail): Atlas {
  const known = atlases.get(detail);
  if (known) return known;
  // Read and parsed here rather than required, so the parsed file is not kept in the module cache for good.
  const file = createRequire(__filename).resolve(`world-atlas/countries-${detail}.json`);
  const topology = JSON.parse(fs.readFileSync(file, 'utf8')) as Topology;
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
  // Kept: the transform, the countries and the packed arcs; maps pass their own objects to topojson-client.
  const atlas = {
    topology: { type: topology.type, objects: {}, ...(topology.transform ? { transform: topology.transform } : {}) },
    arcs: packArcs(topology.arcs),
    countries,
    parts,
  };
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
  const countries: GeometryCollection = {
    type: 'GeometryCollection',
    geometries: [...new Set(parts.map((part) => part.country))].flatMap((i) => atlas.countries[i] ?? []),
  };
  const wanted = countries.geometries.flatMap((geometry) => polygonsOf(geometry).flat(2));
  const topology: Topology = { ...atlas.topology, arcs: unpackArcs(atlas.arcs, wanted) };
  const polygons = feature(topology, land).features.flatMap((f) =>
    f.geometry.type === 'Polygon' ? [f.geometry.coordinates] : [],
  );
  const borders = mesh(topology, countries, (a, b) => a !== b).coordinates;
  const answer: Basemap = { detail, bbox: box, land: clipRings(polygons, box), borders: clipLines(borders, box) };
  if (cache.size >= CACHE_LIMIT) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  cache.set(key, answer);
  return answer;
}
