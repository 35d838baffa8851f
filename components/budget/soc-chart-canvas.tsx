// The Skia part of the state-of-charge chart. Loaded lazily (see soc-chart.web.tsx): importing Skia or
// victory-native anywhere else would pull canvaskit into the main bundle.
import { Nunito_600SemiBold } from '@expo-google-fonts/nunito/600SemiBold';
import { DashPathEffect, Line, Circle, vec, useFont, Text as SkText } from '@shopify/react-native-skia';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Area, AreaRange, CartesianChart, Line as ChartLine, type ChartBounds } from 'victory-native';
import { colors } from '@/components/theme/tokens';
import { indexAt, type SocSeries } from './soc-series';

export type SocChartCanvasProps = {
  series: SocSeries;
  height: number;
  selected: number | null;
  onSelect: (index: number | null) => void;
};

type PointerLike = { nativeEvent: { offsetX?: number; locationX?: number } };

export default function SocChartCanvas({ series, height, selected, onSelect }: SocChartCanvasProps) {
  const font = useFont(Nunito_600SemiBold, 12);
  const [bounds, setBounds] = useState<ChartBounds | null>(null);
  const { points, stops, dayTicks, reservePct } = series;

  const pick = (e: PointerLike) => {
    if (!bounds) return;
    const x = e.nativeEvent.offsetX ?? e.nativeEvent.locationX ?? 0;
    onSelect(indexAt(x, bounds.left, bounds.right, points.length));
  };

  return (
    <View
      style={[styles.wrap, { height }]}
      // Pointer events cover mouse hover and touch on the web; the screen also offers buttons for keyboards.
      onPointerMove={pick}
      onPointerDown={pick}
      onPointerLeave={() => onSelect(null)}
    >
      <CartesianChart
        data={points}
        xKey="x"
        yKeys={['soc', 'better', 'worse']}
        domain={{ y: [0, 100] }}
        padding={{ left: 4, right: 8, top: 8, bottom: 4 }}
        onChartBoundsChange={setBounds}
        xAxis={{
          font,
          tickValues: dayTicks.map((t) => t.x),
          formatXLabel: (x) => dayTicks.find((t) => t.x === x)?.label ?? '',
          labelColor: colors.inkSoft,
          lineColor: colors.line,
        }}
        yAxis={[
          {
            font,
            tickValues: [0, 25, 50, 75, 100],
            formatYLabel: (y) => `${y}%`,
            labelColor: colors.inkSoft,
            lineColor: colors.line,
          },
        ]}
        frame={{ lineColor: colors.line, lineWidth: 0 }}
      >
        {({ points: p, chartBounds, yScale, xScale }) => {
          const reserveY = yScale(reservePct);
          const sel = selected === null ? null : p.soc[selected];
          return (
            <>
              <AreaRange
                upperPoints={p.better}
                lowerPoints={p.worse}
                color={colors.sunlit}
                opacity={0.28}
                curveType="linear"
              />
              <Area points={p.soc} y0={chartBounds.bottom} color={colors.pine} opacity={0.22} curveType="linear" />
              <ChartLine points={p.soc} color={colors.pine} strokeWidth={2.5} curveType="linear" />
              <Line
                p1={vec(chartBounds.left, reserveY)}
                p2={vec(chartBounds.right, reserveY)}
                color={colors.ember}
                strokeWidth={1.5}
              >
                <DashPathEffect intervals={[6, 5]} />
              </Line>
              {font ? (
                <SkText
                  x={chartBounds.left + 6}
                  y={reserveY - 5}
                  text={`reserve ${Math.round(reservePct)}%`}
                  font={font}
                  color={colors.ember}
                />
              ) : null}
              {stops.map((s) => {
                const x = xScale(s.x);
                return (
                  <Line
                    key={`stop-${s.x}`}
                    p1={vec(x, chartBounds.top)}
                    p2={vec(x, chartBounds.bottom)}
                    color={colors.lake}
                    strokeWidth={1}
                    opacity={0.55}
                  >
                    <DashPathEffect intervals={[2, 4]} />
                  </Line>
                );
              })}
              {font
                ? stops.map((s) => (
                    <SkText
                      key={`stop-label-${s.x}`}
                      x={xScale(s.x) + 4}
                      y={chartBounds.top + 14}
                      text={`${s.stopIndex + 1}`}
                      font={font}
                      color={colors.lake}
                    />
                  ))
                : null}
              {sel && sel.y !== null && sel.y !== undefined ? (
                <>
                  <Line
                    p1={vec(sel.x, chartBounds.top)}
                    p2={vec(sel.x, chartBounds.bottom)}
                    color={colors.ink}
                    strokeWidth={1}
                  />
                  <Circle cx={sel.x} cy={sel.y} r={5} color={colors.ink} />
                </>
              ) : null}
            </>
          );
        }}
      </CartesianChart>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { width: '100%' } });
