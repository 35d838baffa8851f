import { WithSkiaWeb } from '@shopify/react-native-skia/lib/module/web';
import { Skeleton } from '@/components/ui/skeleton';
import { CANVASKIT_URL } from './canvaskit-url';
import type { SocChartCanvasProps } from './soc-chart-canvas';

/** Loads canvaskit.wasm and the Skia chart chunk only when a chart is on screen. */
export function SocChartSurface(props: SocChartCanvasProps) {
  return (
    <WithSkiaWeb
      opts={{ locateFile: () => CANVASKIT_URL }}
      getComponent={() => import('./soc-chart-canvas')}
      fallback={<Skeleton testID="soc-chart-loading" height={props.height} />}
      componentProps={props}
    />
  );
}
