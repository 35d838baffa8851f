import { WithSkiaWeb } from '@shopify/react-native-skia/lib/module/web';
import { Skeleton } from '@/components/ui/skeleton';
import type { SocChartCanvasProps } from './soc-chart-canvas';

/** Loads canvaskit.wasm and the Skia chart chunk only when a chart is on screen. */
export function SocChartSurface(props: SocChartCanvasProps) {
  return (
    <WithSkiaWeb
      opts={{ locateFile: (file: string) => `/${file}` }}
      getComponent={() => import('./soc-chart-canvas')}
      fallback={<Skeleton testID="soc-chart-loading" height={props.height} />}
      componentProps={props}
    />
  );
}
