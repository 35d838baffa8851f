import { useEffect, useRef, useState, type ReactNode } from 'react';
import {
  Pressable,
  ScrollView,
  StyleSheet,
  View,
  type LayoutChangeEvent,
  type NativeScrollEvent,
  type NativeSyntheticEvent,
  type StyleProp,
  type ViewStyle,
} from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { Text } from './text';
import { webData } from './web-data';

type Props = {
  children: ReactNode;
  /** What scrolls, for the arrows' labels ("More tabs", "More columns"). */
  what: string;
  testID: string;
  /** The colour behind the row, so the fade at each edge blends into it. */
  fadeColor?: string;
  contentContainerStyle?: StyleProp<ViewStyle>;
  /** Keep this span of the content (x and width) in view, e.g. the selected tab. */
  reveal?: { x: number; width: number };
  accessibilityLabel?: string;
  role?: 'navigation';
  /** Let the keyboard reach the row to scroll it, for content with nothing focusable inside (a table). */
  focusable?: boolean;
};

// Steps of a fade drawn with plain views, so it works the same on every platform.
const FADE = [0.25, 0.5, 0.75, 0.92];
const EDGE = 2;
const FADE_STEP = space.xs + 2;
const ARROW_WIDTH = 36;
// Room an edge's arrow and fade take: a revealed item is kept clear of it.
const ARROW = ARROW_WIDTH + FADE.length * FADE_STEP + space.xs;

/**
 * A row that scrolls sideways and says so: where more content lies past an edge, that edge fades out and shows an
 * arrow that scrolls it into view. Nothing is cut off without a cue.
 */
export function SideScroll({
  children,
  what,
  testID,
  fadeColor = colors.dune,
  contentContainerStyle,
  reveal,
  accessibilityLabel,
  role,
  focusable,
}: Props) {
  const ref = useRef<ScrollView>(null);
  const [box, setBox] = useState({ x: 0, width: 0, content: 0 });
  const moreLeft = box.x > EDGE;
  const moreRight = box.content - box.width - box.x > EDGE;

  const onLayout = (e: LayoutChangeEvent) => {
    const width = e.nativeEvent.layout.width;
    setBox((b) => ({ ...b, width }));
  };
  const onContentSizeChange = (content: number) => setBox((b) => ({ ...b, content }));
  // Bring the chosen item into view (e.g. the Ledger tab, opened from a link) once the row knows its width;
  // the arrow's room at the edge is left free.
  const revealFrom = reveal?.x;
  const revealTo = reveal ? reveal.x + reveal.width : undefined;
  useEffect(() => {
    if (revealFrom === undefined || revealTo === undefined || box.width === 0) return;
    if (revealTo > box.x + box.width - ARROW)
      ref.current?.scrollTo({ x: revealTo - box.width + ARROW, animated: false });
    else if (revealFrom < box.x + ARROW) ref.current?.scrollTo({ x: Math.max(0, revealFrom - ARROW), animated: false });
    // Only when the item or the row's width changes, not on every scroll.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [revealFrom, revealTo, box.width]);
  const onScroll = (e: NativeSyntheticEvent<NativeScrollEvent>) => {
    const { contentOffset, contentSize, layoutMeasurement } = e.nativeEvent;
    setBox({ x: contentOffset.x, width: layoutMeasurement.width, content: contentSize.width });
  };
  const page = (direction: 1 | -1) =>
    ref.current?.scrollTo({ x: Math.max(0, box.x + direction * box.width * 0.7), animated: true });

  return (
    <View style={styles.wrap} onLayout={onLayout} {...webData({ scrollCue: 'true' })}>
      <ScrollView
        ref={ref}
        horizontal
        testID={testID}
        showsHorizontalScrollIndicator={false}
        contentContainerStyle={contentContainerStyle}
        onContentSizeChange={onContentSizeChange}
        onScroll={onScroll}
        scrollEventThrottle={32}
        accessibilityLabel={accessibilityLabel}
        role={role}
        focusable={focusable}
      >
        {children}
      </ScrollView>
      {moreLeft ? <Edge side="left" what={what} color={fadeColor} testID={testID} onPress={() => page(-1)} /> : null}
      {moreRight ? <Edge side="right" what={what} color={fadeColor} testID={testID} onPress={() => page(1)} /> : null}
    </View>
  );
}

type EdgeProps = { side: 'left' | 'right'; what: string; color: string; testID: string; onPress: () => void };

function Edge({ side, what, color, testID, onPress }: EdgeProps) {
  const steps = side === 'right' ? FADE : [...FADE].reverse();
  return (
    <View style={[styles.edge, side === 'right' ? styles.right : styles.left]} pointerEvents="box-none">
      {side === 'right'
        ? steps.map((o) => <View key={o} style={[styles.fade, { backgroundColor: color, opacity: o }]} />)
        : null}
      <Pressable
        testID={`${testID}-more-${side}`}
        accessibilityRole="button"
        accessibilityLabel={`${what} to the ${side}`}
        onPress={onPress}
        style={[styles.arrow, { backgroundColor: color }]}
      >
        <View style={styles.disc}>
          <Text variant="label" color="pine">
            {side === 'right' ? '›' : '‹'}
          </Text>
        </View>
      </Pressable>
      {side === 'left'
        ? steps.map((o) => <View key={o} style={[styles.fade, { backgroundColor: color, opacity: o }]} />)
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { position: 'relative', minWidth: 0 },
  edge: { position: 'absolute', top: 0, bottom: 0, flexDirection: 'row', alignItems: 'stretch' },
  left: { left: 0 },
  right: { right: 0 },
  fade: { width: FADE_STEP },
  arrow: { width: ARROW_WIDTH, alignItems: 'center', justifyContent: 'center' },
  disc: {
    width: 28,
    height: 28,
    borderRadius: 14,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
