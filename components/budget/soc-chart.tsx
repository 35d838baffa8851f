import SocChartCanvas, { type SocChartCanvasProps } from './soc-chart-canvas';

/** Native platforms link Skia directly; the web build uses soc-chart.web.tsx. */
export function SocChartSurface(props: SocChartCanvasProps) {
  return <SocChartCanvas {...props} />;
}
