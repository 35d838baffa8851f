import fs from 'node:fs';
import path from 'node:path';

/**
 * The file a worker pool starts its threads from. The compiled server (`npm start`, see scripts/build-server.ts)
 * finds its compiled worker beside itself, since every module of a bundle shares the bundle's `__dirname`; run from
 * the TypeScript sources (tests, `npm run dev`), there is none there and the thread starts from the `.mjs` entry
 * that registers tsx first.
 * @param moduleDir the calling module's `__dirname`
 * @param compiled the compiled worker's file name in build/
 * @param sourceEntry the `.mjs` entry beside the TypeScript sources
 */
export function workerFile(moduleDir: string, compiled: string, sourceEntry: string): string {
  const built = path.join(moduleDir, compiled);
  return fs.existsSync(built) ? built : path.join(moduleDir, sourceEntry);
}
