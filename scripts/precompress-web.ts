import fs from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import zlib from 'node:zlib';

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

/** What gets ready-made compressed copies: scripts, styles, fonts and the chart's WebAssembly. */
export const PRECOMPRESSED_EXTENSIONS = ['.js', '.css', '.wasm', '.ttf', '.otf', '.woff', '.svg', '.json'];
/** Below this the headers outweigh the saving. */
const SMALLEST_WORTH_IT = 1024;

/** Every file under a folder, at any depth. */
export function filesUnder(dir: string): string[] {
  return fs
    .readdirSync(dir, { withFileTypes: true })
    .flatMap((entry) => (entry.isDirectory() ? filesUnder(path.join(dir, entry.name)) : [path.join(dir, entry.name)]));
}

const textLike = (file: string): boolean => !['.wasm', '.ttf', '.otf', '.woff'].includes(path.extname(file));

async function compressOne(file: string): Promise<{ raw: number; br: number; gz: number }> {
  const raw = await fs.promises.readFile(file);
  // Brotli at its highest quality: done once per build, it saves every visitor bytes on a slow link.
  const brotliDone = brotli(raw, {
    params: {
      [zlib.constants.BROTLI_PARAM_QUALITY]: zlib.constants.BROTLI_MAX_QUALITY,
      [zlib.constants.BROTLI_PARAM_MODE]: textLike(file)
        ? zlib.constants.BROTLI_MODE_TEXT
        : zlib.constants.BROTLI_MODE_GENERIC,
      [zlib.constants.BROTLI_PARAM_LGWIN]: zlib.constants.BROTLI_MAX_WINDOW_BITS,
      [zlib.constants.BROTLI_PARAM_SIZE_HINT]: raw.length,
    },
  });
  const [br, gz] = await Promise.all([brotliDone, gzip(raw, { level: zlib.constants.Z_BEST_COMPRESSION })]);
  await Promise.all([fs.promises.writeFile(`${file}.br`, br), fs.promises.writeFile(`${file}.gz`, gz)]);
  return { raw: raw.length, br: br.length, gz: gz.length };
}

/**
 * Writes `<file>.br` (Brotli, quality 11) and `<file>.gz` (gzip, level 9) beside every script, style, font and
 * WebAssembly file under `dir`, so the server sends bytes compressed once at build time instead of on each request.
 */
export async function precompressDir(dir: string): Promise<{ files: number; raw: number; br: number; gz: number }> {
  const files = filesUnder(dir).filter(
    (file) => PRECOMPRESSED_EXTENSIONS.includes(path.extname(file)) && fs.statSync(file).size >= SMALLEST_WORTH_IT,
  );
  const total = { files: files.length, raw: 0, br: 0, gz: 0 };
  // zlib's async calls run on libuv's thread pool, so the files compress on every core at once; the biggest first,
  // so the longest job is not left for last.
  const bySizeDown = [...files].sort((a, b) => fs.statSync(b).size - fs.statSync(a).size);
  for (const sizes of await Promise.all(bySizeDown.map(compressOne))) {
    total.raw += sizes.raw;
    total.br += sizes.br;
    total.gz += sizes.gz;
  }
  return total;
}
