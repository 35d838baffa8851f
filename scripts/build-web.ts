import { spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { SHELL_FILE } from '../server/web-pages';
import CANVASKIT_BUILD from './metro/canvaskit-build';
import { precompressDir } from './precompress-web';
import { addFontsToPages } from './web-fonts';
import { keepServedPages } from './web-pages';
import { makeOffline } from './web-offline';

const ROOT = path.resolve(__dirname, '..');
const OUT_DIR = path.join(ROOT, 'dist');
const STAMP = path.join(OUT_DIR, '.source-fingerprint');
// Everything that ends up in the web bundle. Server-only folders are left out on purpose.
const SOURCES = [
  'app',
  'components',
  'stores',
  'shared',
  'assets',
  'app.json',
  'package-lock.json',
  'tsconfig.json',
  'metro.config.js',
  'scripts/metro',
  // The pages kept, the fonts' head, the service worker and manifest are written after the export.
  'scripts/web-offline.ts',
  'scripts/web-pages.ts',
  'scripts/web-fonts.ts',
  'server/web-pages.ts',
];

function listFiles(entry: string): string[] {
  const full = path.join(ROOT, entry);
  if (!fs.existsSync(full)) return [];
  if (fs.statSync(full).isFile()) return [entry];
  return fs
    .readdirSync(full, { withFileTypes: true })
    .flatMap((child) => listFiles(path.join(entry, child.name)))
    .sort();
}

/** A hash of the bundle's sources' contents: mtimes change on every clone, contents do not. */
export function sourceFingerprint(): string {
  const hash = crypto.createHash('sha256');
  for (const file of SOURCES.flatMap(listFiles)) {
    hash.update(file);
    hash.update(fs.readFileSync(path.join(ROOT, file)));
  }
  return hash.digest('hex');
}

/**
 * Skia on the web needs canvaskit.wasm beside the app. It comes from the installed canvaskit-wasm package
 * (the build scripts/metro/canvaskit-build.js names, whose loader Metro bundles) and is copied into public/ for the
 * export; it is never committed.
 */
const canvasKitSource = (): string =>
  require.resolve(CANVASKIT_BUILD.WASM, {
    paths: [path.join(ROOT, 'node_modules/@shopify/react-native-skia')],
  });

export function copyCanvasKit(): void {
  const source = canvasKitSource();
  const target = path.join(ROOT, 'public', 'canvaskit.wasm');
  fs.mkdirSync(path.dirname(target), { recursive: true });
  if (!fs.existsSync(target) || fs.statSync(target).size !== fs.statSync(source).size) fs.copyFileSync(source, target);
}

/**
 * The exported app loads canvaskit.wasm from a name that carries a hash of its contents, under `_expo/static/`, so
 * it is cached for a year like the scripts and a new Skia release is a new name.
 */
export function hashedCanvasKitUrl(): string {
  const hash = crypto.createHash('sha256').update(fs.readFileSync(canvasKitSource())).digest('hex').slice(0, 16);
  return `/_expo/static/wasm/canvaskit-${hash}.wasm`;
}

export async function ensureWebBuild({ force = false } = {}): Promise<void> {
  const fingerprint = sourceFingerprint();
  const current = fs.existsSync(STAMP) ? fs.readFileSync(STAMP, 'utf8').trim() : '';
  if (!force && current === fingerprint && fs.existsSync(path.join(OUT_DIR, SHELL_FILE))) {
    console.log('Web app is up to date (dist/).');
    return;
  }
  console.log(
    current
      ? 'Web app sources changed: rebuilding dist/ …'
      : 'Building the web app into dist/ (first start; about a minute) …',
  );
  copyCanvasKit();
  // Metro keeps its transform cache in the system temp folder, keyed by each file's real path. Checkouts that share
  // one node_modules (linked worktrees) share expo-router's route-context file, so one checkout's build would reuse
  // another's cached pointer to its app/ folder and ship that checkout's screens. A cache per checkout prevents it.
  // --clear: Metro's cache keeps the old list of route files, so a route added since the last build would be missing.
  const metroTemp = path.join(ROOT, '.expo', 'build-tmp');
  fs.mkdirSync(metroTemp, { recursive: true });
  const canvasKitUrl = hashedCanvasKitUrl();
  const sourceMaps = process.argv.includes('--source-maps') ? ['--source-maps'] : [];
  const result = spawnSync(
    'npx',
    ['expo', 'export', '--platform', 'web', '--output-dir', 'dist', '--clear', ...sourceMaps],
    {
      cwd: ROOT,
      stdio: 'inherit',
      // The chart's loader reads the wasm's address from this (inlined at build time).
      env: {
        ...process.env,
        CI: '1',
        EXPO_NO_TELEMETRY: '1',
        TMPDIR: metroTemp,
        EXPO_PUBLIC_CANVASKIT_URL: canvasKitUrl,
      },
    },
  );
  if (result.status !== 0) throw new Error('The web build failed; see the output above.');
  // public/ holds the plain name for the development server; the export serves only the hashed one.
  fs.rmSync(path.join(OUT_DIR, 'canvaskit.wasm'), { force: true });
  const hashedWasm = path.join(OUT_DIR, canvasKitUrl);
  fs.mkdirSync(path.dirname(hashedWasm), { recursive: true });
  fs.copyFileSync(canvasKitSource(), hashedWasm);
  const pages = keepServedPages(OUT_DIR);
  addFontsToPages(OUT_DIR, pages);
  const offline = await makeOffline(OUT_DIR, pages);
  console.log(`Service worker precaches ${offline.count} files (${(offline.size / 1e6).toFixed(1)} MB).`);
  console.log('Compressing scripts, fonts and the wasm (Brotli 11 and gzip) …');
  const sizes = await precompressDir(OUT_DIR);
  const mb = (bytes: number): string => `${(bytes / 1e6).toFixed(2)} MB`;
  console.log(`${sizes.files} files: ${mb(sizes.raw)} raw, ${mb(sizes.gz)} gzip, ${mb(sizes.br)} Brotli.`);
  fs.writeFileSync(STAMP, `${fingerprint}\n`);
  console.log('Web app built.');
}

if (require.main === module) {
  ensureWebBuild({ force: process.argv.includes('--force') || process.argv.includes('--source-maps') }).catch(
    (error: unknown) => {
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    },
  );
}
