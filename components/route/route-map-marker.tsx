import { useMemo, useRef, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import type { ChargeTone } from '@/shared/route-charge';
import { useMarkerDrag } from './use-marker-drag';
import { useMarkerKeys } from './use-marker-keys';

export type MarkerProps = {
  index: number;
  label: string;
  x: number;
  y: number;
  tone: ChargeTone | null;
  size: number;
  testID: string;
  onPress?: () => void;
  /** Drags and arrow keys report where the marker's centre ends up, in map pixels. */
  onMove?: (x: number, y: number) => void;
};

/**
 * A numbered stop on the map. The shape says the same as the colour, so it reads in black and white and for
 * colour-blind eyes: a circle when the charge stays comfortable, a ringed circle close to the reserve, a square
 * below it.
 */
export function RouteMapMarker({ index, label, x, y, tone, size, testID, onPress, onMove }: MarkerProps) {
  const ref = useRef<View>(null);
  const [drag, setDrag] = useState<{ dx: number; dy: number } | null>(null);
  const dragging = useMemo(
    () =>
      onMove
        ? {
            onDrag: (dx: number, dy: number) => setDrag(dx === 0 && dy === 0 ? null : { dx, dy }),
            onDrop: (dx: number, dy: number) => {
              setDrag(null);
              onMove(x + dx, y + dy);
            },
          }
        : undefined,
    [onMove, x, y],
  );
  const dragHandlers = useMarkerDrag(ref, dragging);
  useMarkerKeys(ref, onMove ? (dx, dy) => onMove(x + dx, y + dy) : undefined);
  const cx = x + (drag?.dx ?? 0);
  const cy = y + (drag?.dy ?? 0);
  const shape = tone === 'ember' ? styles.square : styles.round;
  const fill =
    tone === 'ember'
      ? colors.emberInk
      : tone === 'sunlit'
        ? colors.sunlit
        : tone === 'pine'
          ? colors.pine
          : colors.mist;
  const ink = tone === 'sunlit' ? 'ink' : 'white';
  const face = [
    styles.marker,
    shape,
    { width: size, height: size, backgroundColor: fill },
    tone === 'sunlit' ? styles.ring : null,
  ];
  const number = (
    <Text variant={size >= 28 ? 'label' : 'caption'} color={ink} style={styles.number}>
      {index + 1}
    </Text>
  );
  const place = { left: cx - size / 2, top: cy - size / 2, width: size, height: size };
  // A marker that does nothing is a picture: the map's own label speaks for it.
  if (!onPress && !onMove)
    return (
      <View testID={testID} style={[styles.wrap, place, face]} pointerEvents="none" aria-hidden>
        {number}
      </View>
    );
  return (
    <View {...dragHandlers} style={[styles.wrap, place]} pointerEvents="box-none">
      <Pressable
        ref={ref}
        testID={testID}
        role="button"
        accessibilityLabel={label}
        onPress={onPress}
        style={({ pressed }) => [face, styles.grab, pressed || drag ? styles.active : null]}
      >
        {number}
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { position: 'absolute' },
  marker: {
    alignItems: 'center',
    justifyContent: 'center',
    borderWidth: 2,
    borderColor: colors.white,
  },
  // A drag on the web must not select text.
  grab: { userSelect: 'none', cursor: 'pointer' },
  round: { borderRadius: 999 },
  square: { borderRadius: 4 },
  ring: { borderColor: colors.ink, borderStyle: 'dashed' },
  active: { transform: [{ scale: 1.15 }] },
  number: { lineHeight: undefined },
});
