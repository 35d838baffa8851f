// The route map itself, loaded lazily (route-map.tsx) so d3 and the drawing stay out of the first screen's bundle.
// Natural Earth land and borders come from the server, cut to what is on screen; the rest is drawn from the trip.
import { useRef, useState } from 'react';
import { Pressable, StyleSheet, View, type GestureResponderEvent, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts, radii } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import { useBasemapQuery } from '@/stores/queries/places';
import {
  basemapPaths,
  drivePath,
  fitProjection,
  pointToLatLon,
  projectStops,
  scaleBar,
  visibleExtent,
  type MapSize,
} from './route-map-geometry';
import { RouteMapMarker } from './route-map-marker';
import type { MapStop, RouteMapProps } from './route-map-types';

const TONE_WORDS = { pine: 'stays comfortable', sunlit: 'close to the reserve', ember: 'below the reserve' } as const;

function markerLabel(stop: MapStop, i: number, interactive: { open: boolean; move: boolean }): string {
  const charge =
    stop.lowestSocPct === null
      ? 'no budget yet'
      : `lowest charge ${Math.round(stop.lowestSocPct)} %${stop.tone ? `, ${TONE_WORDS[stop.tone]}` : ''}`;
  const actions = [
    interactive.open ? 'press to open it' : null,
    interactive.move ? 'drag or use the arrow keys to move it' : null,
  ].filter(Boolean);
  return `Stop ${i + 1}, ${stop.name}, ${charge}${actions.length ? `. ${actions.join('; ')}` : ''}.`;
}

export default function RouteMapCanvas({
  stops,
  height,
  testID,
  label,
  compact = false,
  onOpenStop,
  onMoveStop,
  placingStopId = null,
}: RouteMapProps) {
  const [width, setWidth] = useState(0);
  const container = useRef<View>(null);
  const size: MapSize = { width, height, padding: compact ? 18 : 36 };
  const projection = fitProjection(stops, size);
  const extent = projection ? visibleExtent(projection, size) : null;
  const basemap = useBasemapQuery(extent);
  const paths = projection && basemap.data ? basemapPaths(basemap.data, projection) : null;
  const points = projection ? projectStops(stops, projection) : [];
  const scale = projection && !compact ? scaleBar(projection, size, width / 4) : null;
  const markerSize = compact ? 20 : 32;

  const moveTo = (stopId: string, x: number, y: number) => {
    const to = projection ? pointToLatLon(projection, x, y) : null;
    if (to) onMoveStop?.(stopId, to);
  };
  const placePin = (event: GestureResponderEvent) => {
    const { pageX, pageY } = event.nativeEvent;
    if (!placingStopId) return;
    container.current?.measure((_x, _y, _w, _h, left, top) => moveTo(placingStopId, pageX - left, pageY - top));
  };

  return (
    <View
      ref={container}
      testID={testID}
      style={[styles.map, { height }, compact ? styles.compact : null]}
      onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}
    >
      {width > 0 ? (
        // Out of the flow: a drawing sized by the last layout must never hold its box wider than the card.
        <Svg width={width} height={height} role="img" accessibilityLabel={label} style={StyleSheet.absoluteFill}>
          <Rect x={0} y={0} width={width} height={height} fill={colors.infoSoft} />
          {paths ? (
            <G>
              <Path d={paths.land} fill={colors.dune} stroke={colors.mist} strokeWidth={0.8} fillRule="evenodd" />
              <Path d={paths.borders} fill="none" stroke={colors.mist} strokeWidth={1} strokeDasharray="5 4" />
            </G>
          ) : null}
          {points.length > 1 ? (
            <G>
              <Path d={drivePath(points)} fill="none" stroke={colors.white} strokeWidth={compact ? 4 : 7} />
              <Path
                d={drivePath(points)}
                fill="none"
                stroke={colors.lake}
                strokeWidth={compact ? 2 : 3}
                strokeLinejoin="round"
              />
            </G>
          ) : null}
          {scale ? (
            <G testID={`${testID}-scale`}>
              <Line x1={12} y1={height - 14} x2={12 + scale.px} y2={height - 14} stroke={colors.ink} strokeWidth={2} />
              <Line x1={12} y1={height - 19} x2={12} y2={height - 9} stroke={colors.ink} strokeWidth={2} />
              <Line
                x1={12 + scale.px}
                y1={height - 19}
                x2={12 + scale.px}
                y2={height - 9}
                stroke={colors.ink}
                strokeWidth={2}
              />
              <SvgText x={12} y={height - 22} fontSize={11} fontFamily={fonts.bold} fill={colors.ink}>
                {`${scale.km} km`}
              </SvgText>
            </G>
          ) : null}
        </Svg>
      ) : null}
      {placingStopId ? (
        <Pressable
          testID={`${testID}-place-pin`}
          accessibilityLabel="Place the pin here"
          role="button"
          style={styles.placing}
          onPress={placePin}
        />
      ) : null}
      {points.map((point, i) => {
        const stop = stops[i];
        if (!stop) return null;
        return (
          <RouteMapMarker
            key={stop.id}
            index={i}
            testID={`${testID}-marker-${i}`}
            label={markerLabel(stop, i, { open: !!onOpenStop, move: !!onMoveStop })}
            x={point.x}
            y={point.y}
            tone={stop.tone}
            size={markerSize}
            onPress={onOpenStop ? () => onOpenStop(stop.id) : undefined}
            onMove={onMoveStop ? (x, y) => moveTo(stop.id, x, y) : undefined}
          />
        );
      })}
      {basemap.isError && !compact ? (
        <Text variant="caption" color="inkSoft" style={styles.note}>
          The map’s background could not be loaded; the stops are drawn without it.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  map: { width: '100%', overflow: 'hidden', borderRadius: radii.md, backgroundColor: colors.infoSoft },
  compact: { borderRadius: radii.sm },
  placing: { position: 'absolute', top: 0, left: 0, right: 0, bottom: 0, cursor: 'pointer' },
  note: { position: 'absolute', top: 8, left: 12, right: 12 },
});
