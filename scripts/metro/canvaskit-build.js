// Which CanvasKit build the web app ships. Skia's web loader imports the "full" build, which adds Skottie (Lottie
// animations) to the standard one; the app draws no animations, so it ships the standard build: the same drawing
// API and a wasm about 260 kB smaller as Brotli (1.3 s less on a 200 KiB/s link). The loader's JavaScript and the wasm
// must come from the same build: Metro redirects the loader (metro.config.js), the export copies this wasm
// (scripts/build-web.ts), and tests/scripts/canvaskit-build.test.ts checks that every member Skia reads outside its
// Skottie files exists in this build.
module.exports = {
  /** What Skia's `LoadSkiaWeb` imports. */
  SKIA_LOADER_IMPORT: 'canvaskit-wasm/bin/full/canvaskit',
  /** What the app bundles in its place. */
  LOADER: 'canvaskit-wasm/bin/canvaskit',
  WASM: 'canvaskit-wasm/bin/canvaskit.wasm',
};
