// The chart's code as one lazily loaded chunk whose modules are defined when it arrives but run only when
// `chartCanvas()` is called: Skia reads the global CanvasKit as its modules run, so they must wait for the wasm,
// while the chunk's bytes can travel at the same time as the wasm's.
import type { ComponentType } from 'react';
import type * as ChartCanvasModule from './soc-chart-canvas';
import type { SocChartCanvasProps } from './soc-chart-canvas';

export function chartCanvas(): ComponentType<SocChartCanvasProps> {
  // A require inside the function (not an import at the top) defers running Skia's modules until this call.
  return (require('./soc-chart-canvas') as typeof ChartCanvasModule).default;
}
