import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import type { Stop } from '@/shared/schemas/trip';
import { horizonOutline, pathOf, polar, sunTrack } from './sun-path-geometry';

const SIZE = 260;
const C = SIZE / 2;
const R = SIZE / 2 - 22;

/**
 * The sun's path over the stop for its first and last day, on a compass with the horizon and canopy drawn in:
 * where the yellow track runs inside the green, the panels are shaded.
 */
export function SunPath({ stop, testID }: { stop: Stop; testID: string }) {
  const horizon = horizonOutline(stop.exposure, C, C, R);
  const first = sunTrack(stop.arriveAt, stop.timeZone, stop.lat, stop.lon, C, C, R);
  const last = sunTrack(stop.departAt, stop.timeZone, stop.lat, stop.lon, C, C, R);
  const tracks = first.label === last.label ? [first] : [first, last];
  // Darker green where less light gets through the obstruction, but never opaque: the sky's rings and the sun's
  // track must show through even a deep forest.
  const shade = 0.12 + 0.26 * (1 - horizon.canopyTransmittance);
  // Noon is labelled once, on the first day's track (the days' tracks nearly coincide).
  const noon = first.hours.find((h) => h.hour === 12);
  const outer = `M${C - R},${C} a${R},${R} 0 1,0 ${2 * R},0 a${R},${R} 0 1,0 ${-2 * R},0 Z`;
  const shaded = tracks.some((t) => t.points.length > 0) && horizon.canopyTransmittance < 1;
  return (
    <View style={styles.wrap} testID={testID}>
      <Svg
        width={SIZE}
        height={SIZE}
        viewBox={`0 0 ${SIZE} ${SIZE}`}
        accessibilityLabel={`Sun path at ${stop.name}`}
        role="img"
      >
        <Circle cx={C} cy={C} r={R} fill={colors.white} stroke={colors.line} strokeWidth={1} />
        <Path
          d={`${outer} ${pathOf(horizon.points, true)}`}
          fill={colors.pine}
          fillOpacity={shade}
          fillRule="evenodd"
        />
        <Path d={pathOf(horizon.points, true)} fill="none" stroke={colors.pine} strokeWidth={1.5} strokeOpacity={0.7} />
        {[30, 60].map((alt) => (
          <Circle
            key={alt}
            cx={C}
            cy={C}
            r={(R * (90 - alt)) / 90}
            fill="none"
            stroke={colors.line}
            strokeDasharray="3 4"
          />
        ))}
        <Line x1={C} y1={C - R} x2={C} y2={C + R} stroke={colors.line} />
        <Line x1={C - R} y1={C} x2={C + R} y2={C} stroke={colors.line} />
        {tracks.map((t, i) => (
          <G key={t.label}>
            <Path
              d={pathOf(t.points)}
              stroke={colors.sunlit}
              strokeWidth={i === 0 ? 3 : 2}
              strokeDasharray={i === 0 ? undefined : '6 4'}
              fill="none"
            />
            {t.hours.map((h) => (
              <Circle key={h.hour} cx={h.at.x} cy={h.at.y} r={2.5} fill={colors.ink} />
            ))}
          </G>
        ))}
        {noon ? (
          // A light backing keeps the label readable over the canopy and the rings.
          <G>
            <Rect
              x={noon.at.x + 3}
              y={noon.at.y - 17}
              width={36}
              height={15}
              rx={4}
              fill={colors.white}
              opacity={0.85}
            />
            <SvgText x={noon.at.x + 6} y={noon.at.y - 6} fontSize={11} fontFamily={fonts.bold} fill={colors.ink}>
              12:00
            </SvgText>
          </G>
        ) : null}
        {(['N', 'E', 'S', 'W'] as const).map((d, i) => {
          const p = polar(-8, i * 90, C, C, R + 14);
          return (
            <SvgText
              key={d}
              x={p.x}
              y={p.y + 4}
              fontSize={12}
              fontFamily={fonts.bold}
              fill={colors.inkSoft}
              textAnchor="middle"
            >
              {d}
            </SvgText>
          );
        })}
      </Svg>
      <Text variant="caption" color="inkSoft" style={styles.caption}>
        Yellow: the sun on {tracks.map((t) => t.label).join(' (solid) and ')}
        {tracks.length > 1 ? ' (dashed)' : ''}; dots mark each hour. Green: trees and terrain
        {shaded ? ' — where the track crosses it, the panels are shaded' : ''}.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { alignItems: 'center', gap: space.xs },
  caption: { textAlign: 'center', maxWidth: 320 },
});
