import type { ComponentType } from 'react';
import { CANVASKIT_URL } from './canvaskit-url';
import type { SocChartCanvasProps } from './soc-chart-canvas';

let loading: Promise<ComponentType<SocChartCanvasProps>> | undefined;
let firstLoadSettled: () => void = () => undefined;
const firstLoad = new Promise<void>((resolve) => (firstLoadSettled = resolve));

/** Settles when the chart's bytes have first arrived (or failed to): what may wait for the chart's share of the link. */
export function chartBytesFirstSettled(): Promise<void> {
  return firstLoad;
}

/** Fetches the wasm into the HTTP cache (it is cached for a year), so Skia's own request for it is answered there. */
async function fetchWasm(): Promise<void> {
  const response = await fetch(CANVASKIT_URL, { credentials: 'same-origin' });
  if (!response.ok) throw new Error(`canvaskit.wasm: HTTP ${response.status}`);
  await response.arrayBuffer();
}

/**
 * The state-of-charge chart's component, loading everything it needs once: canvaskit.wasm, Skia's loader and the
 * chart's chunk are requested side by side; Skia starts when the wasm is in, the chart's modules run after that.
 * A failure is forgotten, so the next chart on screen tries again.
 */
export function loadChartCanvas(): Promise<ComponentType<SocChartCanvasProps>> {
  loading ??= (async () => {
    const wasm = fetchWasm();
    const skiaLoader = import('@shopify/react-native-skia/lib/module/web/LoadSkiaWeb');
    const chart = import('./soc-chart-chunk');
    const [{ LoadSkiaWeb }] = await Promise.all([skiaLoader, wasm]);
    await LoadSkiaWeb({ locateFile: () => CANVASKIT_URL });
    return (await chart).chartCanvas();
  })();
  loading.then(firstLoadSettled, () => {
    firstLoadSettled();
    loading = undefined;
  });
  return loading;
}

/** Starts loading the chart in the background; nothing waits for it and a failure is left for the chart to show. */
export function preloadChart(): void {
  loadChartCanvas().catch(() => undefined);
}
