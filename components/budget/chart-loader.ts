// Native platforms link Skia into the app: there is nothing to fetch ahead (the web build uses chart-loader.web.ts).
export function preloadChart(): void {}

/** Nothing is fetched for the chart on native platforms: nothing to wait for. */
export function chartBytesFirstSettled(): Promise<void> {
  return Promise.resolve();
}
