// Native platforms link Skia into the app: there is nothing to fetch ahead (the web build uses chart-loader.web.ts).
export function preloadChart(): void {}
