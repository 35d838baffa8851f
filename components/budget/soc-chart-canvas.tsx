// The Skia part of the state-of-charge chart. Loaded lazily (see soc-chart.web.tsx): importing Skia or
// victory-native anywhere else would pull canvaskit into the main bundle.
import { Nunito_600SemiBold } from '@expo-google-fonts/nunito/600SemiBold';
import { Nunito_800ExtraBold } from '@expo-google-fonts/nunito/800ExtraBold';
import {
  Circle,
  DashPathEffect,
  Line,
  Path,
  Text as SkText,
  useFont,
  vec,
  type SkFont,
} from '@shopify/react-native-skia';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Area, AreaRange, CartesianChart, Line as ChartLine, type ChartBounds } from 'victory-native';
import { colors } from '@/components/theme/tokens';
import { webData } from '@/components/ui/web-data';
import {
  axisTicks,
  inRange,
  indexAt,
  placeFlagLabels,
  placeLabels,
  type AxisTick,
  type SocRange,
  type SocSeries,
} from './soc-series';

export type SocChartCanvasProps = {
  series: SocSeries;
  range: SocRange;
  height: number;
  selected: number | null;
  onSelect: (index: number | null) => void;
};

type PointerLike = { nativeEvent: { offsetX?: number; locationX?: number } };

// Room above the plot for the flags' numbers, and below it for the time axis's labels.
const FLAG_LANE = 26;
const AXIS_LANE = 22;

// Glyph widths work on every platform (measureText is not implemented for the web).
const widthOf = (font: SkFont) => (text: string) =>
  font.getGlyphWidths(font.getGlyphIDs(text)).reduce((sum, w) => sum + w, 0);

export default function SocChartCanvas({ series, range, height, selected, onSelect }: SocChartCanvasProps) {
  const font = useFont(Nunito_600SemiBold, 12);
  const bold = useFont(Nunito_800ExtraBold, 12);
  const [bounds, setBounds] = useState<ChartBounds | null>(null);
  // Where the range's first and last hours land, px: published for the browser tests, which check that the whole
  // range lies inside the plot (canvas drawing has no DOM to inspect).
  const [reach, setReach] = useState({ first: 0, last: 0 });
  const { points, stops, reservePct } = series;
  // victory-native takes the x domain from the tick values unless it is given one: always give the range, so the
  // chart ends where the trip (or the chosen day) ends.
  const to = range.to > range.from ? range.to : range.from + 1;
  const data = points.slice(range.from, to + 1);
  const ticks = axisTicks(series, range);

  const pick = (e: PointerLike) => {
    if (!bounds) return;
    const x = e.nativeEvent.offsetX ?? e.nativeEvent.locationX ?? 0;
    onSelect(indexAt(x, bounds.left, bounds.right, range));
  };

  return (
    <View
      style={[styles.wrap, { height }]}
      {...webData({
        plotLeft: String(bounds?.left ?? ''),
        plotRight: String(bounds?.right ?? ''),
        firstX: String(reach.first),
        lastX: String(reach.last),
      })}
      // Pointer events cover mouse hover and touch on the web; the screen also offers buttons for keyboards.
      onPointerMove={pick}
      onPointerDown={pick}
      onPointerLeave={() => onSelect(null)}
    >
      <CartesianChart
        data={data}
        xKey="x"
        yKeys={['soc', 'better', 'worse']}
        domain={{ x: [range.from, to], y: [0, 100] }}
        padding={{ left: 4, right: 8, top: FLAG_LANE, bottom: AXIS_LANE }}
        onChartBoundsChange={setBounds}
        onScaleChange={(x) => {
          const next = { first: x(range.from), last: x(to) };
          // Called after every render: keep the state object unless a value moved, or it would render forever.
          setReach((r) => (r.first === next.first && r.last === next.last ? r : next));
        }}
        // A line at every tick: without a tick count, victory-native thins the values to five.
        xAxis={{ font: null, tickValues: ticks.map((t) => t.x), tickCount: ticks.length, lineColor: colors.line }}
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
        // The plot clips what its children draw; labels in the lanes above and below it are drawn outside.
        renderOutside={({ chartBounds, xScale, yScale }) => (
          <Outside
            series={series}
            range={range}
            ticks={ticks}
            bounds={chartBounds}
            xScale={xScale}
            yScale={yScale}
            font={font}
            bold={bold}
          />
        )}
      >
        {({ points: p, chartBounds, yScale, xScale }) => {
          const { left, right, top, bottom } = chartBounds;
          const reserveY = yScale(reservePct);
          const sel = selected === null || !inRange(range, selected) ? null : p.soc[selected - range.from];
          const shownStops = stops.filter((s) => inRange(range, s.x));
          return (
            <>
              <AreaRange
                upperPoints={p.better}
                lowerPoints={p.worse}
                color={colors.sunlit}
                opacity={0.28}
                curveType="linear"
              />
              <Area points={p.soc} y0={bottom} color={colors.pine} opacity={0.22} curveType="linear" />
              <ChartLine points={p.soc} color={colors.pine} strokeWidth={2.5} curveType="linear" />
              <Line p1={vec(left, reserveY)} p2={vec(right, reserveY)} color={colors.ember} strokeWidth={1.5}>
                <DashPathEffect intervals={[6, 5]} />
              </Line>
              {font ? (
                <SkText
                  x={left + 6}
                  y={reserveY - 5}
                  text={`reserve ${Math.round(reservePct)}%`}
                  font={font}
                  color={colors.emberInk}
                />
              ) : null}
              {shownStops.map((s) => (
                <Line
                  key={`stop-${s.x}`}
                  p1={vec(xScale(s.x), top)}
                  p2={vec(xScale(s.x), bottom)}
                  color={colors.lake}
                  strokeWidth={1}
                  opacity={0.55}
                >
                  <DashPathEffect intervals={[2, 4]} />
                </Line>
              ))}
              {font
                ? shownStops.map((s) => (
                    <SkText
                      key={`stop-label-${s.x}`}
                      x={Math.min(xScale(s.x) + 4, right - 10)}
                      y={top + 14}
                      text={`${s.stopIndex + 1}`}
                      font={font}
                      color={colors.lakeInk}
                    />
                  ))
                : null}
              {sel && sel.y !== null && sel.y !== undefined ? (
                <>
                  <Line p1={vec(sel.x, top)} p2={vec(sel.x, bottom)} color={colors.ink} strokeWidth={1} />
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

type OutsideProps = {
  series: SocSeries;
  range: SocRange;
  ticks: AxisTick[];
  bounds: ChartBounds;
  xScale: (x: number) => number;
  yScale: (y: number) => number;
  font: SkFont | null;
  bold: SkFont | null;
};

/** The time axis's labels, the flags' marks and numbers, and the lowest point: laid out so none overprints. */
function Outside({ series, range, ticks, bounds, xScale, yScale, font, bold }: OutsideProps) {
  const { left, right, top, bottom } = bounds;
  const axisLabels = font ? placeLabels(ticks, { scale: xScale, left, right, measure: widthOf(font) }) : [];
  const flags = series.flags.filter((f) => inRange(range, f.x));
  const flagLabels = bold ? placeFlagLabels(flags, { scale: xScale, left, right, measure: widthOf(bold) }) : [];
  const lowest = series.lowest;
  const lowX = xScale(lowest.x);
  const lowY = yScale(lowest.soc);
  const lowText = `lowest ${Math.round(lowest.soc)}%`;
  const lowWidth = bold ? widthOf(bold)(lowText) : 0;
  return (
    <>
      {axisLabels.map((l) => (
        <SkText key={`day-${l.x}`} x={l.left} y={bottom + 16} text={l.text} font={font} color={colors.inkSoft} />
      ))}
      {flags.map((f) => {
        const x = xScale(f.x);
        return (
          <Path
            key={`flag-${f.x}`}
            path={`M${x - 4},${top - 8} L${x + 4},${top - 8} L${x},${top - 1} Z`}
            color={f.danger ? colors.ember : colors.sunlit}
          />
        );
      })}
      {flagLabels.map((l) => (
        <SkText
          key={`flag-label-${l.x}`}
          x={l.left}
          y={top - 11}
          text={l.text}
          font={bold}
          color={l.danger ? colors.emberInk : colors.ink}
        />
      ))}
      {inRange(range, lowest.x) ? (
        <>
          <Circle cx={lowX} cy={lowY} r={6} color={colors.ember} style="stroke" strokeWidth={2.5} />
          {bold ? (
            <SkText
              x={Math.min(Math.max(left + 2, lowX - lowWidth / 2), right - lowWidth)}
              // Above the point unless it sits near the top, where there is no room.
              y={lowY - 24 > top ? lowY - 11 : lowY + 20}
              text={lowText}
              font={bold}
              color={colors.emberInk}
            />
          ) : null}
        </>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({ wrap: { width: '100%' } });
