import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

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

function compressOne(file: string): { raw: number; br: number; gz: number } {
  const raw = fs.readFileSync(file);
  // Brotli at its highest quality: done once per build, it saves every visitor bytes on a slow link.
  const br = zlib.brotliCompressSync(raw, {
    params: {
      [zlib.constants.BROTLI_PARAM_QUALITY]: zlib.constants.BROTLI_MAX_QUALITY,
      [zlib.constants.BROTLI_PARAM_MODE]: textLike(file)
        ? zlib.constants.BROTLI_MODE_TEXT
        : zlib.constants.BROTLI_MODE_GENERIC,
      [zlib.constants.BROTLI_PARAM_LGWIN]: zlib.constants.BROTLI_MAX_WINDOW_BITS,
      [zlib.constants.BROTLI_PARAM_SIZE_HINT]: raw.length,
    },
  });
  const gz = zlib.gzipSync(raw, { level: zlib.constants.Z_BEST_COMPRESSION });
  fs.writeFileSync(`${file}.br`, br);
  fs.writeFileSync(`${file}.gz`, gz);
  return { raw: raw.length, br: br.length, gz: gz.length };
}

/**
 * Writes `<file>.br` (Brotli, quality 11) and `<file>.gz` (gzip, level 9) beside every script, style, font and
 * WebAssembly file under `dir`, so the server sends bytes compressed once at build time instead of on each request.
 */
export function precompressDir(dir: string): { files: number; raw: number; br: number; gz: number } {
  const files = filesUnder(dir).filter(
    (file) => PRECOMPRESSED_EXTENSIONS.includes(path.extname(file)) && fs.statSync(file).size >= SMALLEST_WORTH_IT,
  );
  const total = { files: files.length, raw: 0, br: 0, gz: 0 };
  for (const file of files) {
    const sizes = compressOne(file);
    total.raw += sizes.raw;
    total.br += sizes.br;
    total.gz += sizes.gz;
  }
  return total;
}
