import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import CANVASKIT_BUILD from '@/scripts/metro/canvaskit-build';

const skiaRoot = path.dirname(require.resolve('@shopify/react-native-skia/package.json'));
const fromSkia = (request: string): string => require.resolve(request, { paths: [skiaRoot] });

/** Every `CanvasKit.<member>` Skia's web code reads, outside the Skottie files (the app draws no animations). */
function membersSkiaReads(): string[] {
  const dir = path.join(skiaRoot, 'lib/module/skia/web');
  const members = new Set<string>();
  for (const file of fs.readdirSync(dir)) {
    if (!file.endsWith('.js') || file.includes('Skottie')) continue;
    for (const match of fs.readFileSync(path.join(dir, file), 'utf8').matchAll(/CanvasKit\.([A-Za-z_]\w*)/g))
      if (match[1]) members.add(match[1]);
  }
  return [...members].sort();
}

describe('the CanvasKit build the web app ships', () => {
  it('when the standard build is loaded, then every CanvasKit member Skia draws with exists in it', async () => {
    const init = (await import(fromSkia(`${CANVASKIT_BUILD.LOADER}.js`))) as {
      default: (options: { locateFile: () => string }) => Promise<Record<string, unknown>>;
    };
    const canvasKit = await init.default({ locateFile: () => fromSkia(CANVASKIT_BUILD.WASM) });
    const read = membersSkiaReads();
    expect(read.length).toBeGreaterThan(30);
    // HEAPU is a typed-array view name Skia feature-tests for, not an API member; no build defines it.
    expect(read.filter((member) => member !== 'HEAPU' && canvasKit[member] === undefined)).toEqual([]);
  });

  it('when Skia is updated, then its loader still imports the build the app swaps out', () => {
    const loader = fs.readFileSync(path.join(skiaRoot, 'lib/module/web/LoadSkiaWeb.js'), 'utf8');
    expect(loader).toContain(`from "${CANVASKIT_BUILD.SKIA_LOADER_IMPORT}"`);
  });
});
