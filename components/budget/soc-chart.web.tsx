import { lazy, Suspense } from 'react';
import { Skeleton } from '@/components/ui/skeleton';
import { loadChartCanvas } from './chart-loader.web';
import type { SocChartCanvasProps } from './soc-chart-canvas';

// The same promise a trip page or the Trips screen may already have started (chart-loader.web.ts).
const SocChartCanvas = lazy(async () => ({ default: await loadChartCanvas() }));

/** Loads canvaskit.wasm and the Skia chart chunk only when a chart is (or is about to be) on screen. */
export function SocChartSurface(props: SocChartCanvasProps) {
  return (
    <Suspense fallback={<Skeleton testID="soc-chart-loading" height={props.height} />}>
      <SocChartCanvas {...props} />
    </Suspense>
  );
}
