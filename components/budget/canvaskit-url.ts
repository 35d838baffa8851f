/**
 * Where Skia's canvaskit.wasm is fetched from: the exported app serves it under a content-hashed name (set by
 * scripts/build-web.ts at build time) so it can be cached for a year; the development server serves the plain name.
 */
export const CANVASKIT_URL: string = process.env.EXPO_PUBLIC_CANVASKIT_URL ?? '/canvaskit.wasm';
