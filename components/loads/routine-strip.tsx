import { useRef, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import type { RoutineWindow } from '@/shared/schemas/common';
import { cellsFor, cellsPerRow, HOURS, paintRange, toggleCell, type StripKey } from './routine-cells';

type Props = {
  windows: RoutineWindow[];
  strip: StripKey;
  disabled: boolean;
  onChange: (w: RoutineWindow[]) => void;
  testID: string;
};

type PointerTarget = { releasePointerCapture?: (id: number) => void; hasPointerCapture?: (id: number) => boolean };
type PointerEventLike = { nativeEvent: { pointerId?: number; target?: unknown; pointerType?: string } };

/**
 * One day as 24 one-hour cells, as many to a row as fit the width at about a thumb's size each (never wider than
 * the card). Tap or press Enter/Space on a cell to toggle it;
 * press and drag across cells to paint them all with the first cell's new state.
 */
export function RoutineStrip({ windows, strip, disabled, onChange, testID }: Props) {
  const [width, setWidth] = useState(0);
  const cells = cellsFor(windows, strip);
  // Drag state lives in a ref: it changes on every pointer move and must not re-render the strip.
  const drag = useRef<{ from: number; on: boolean; moved: boolean; base: RoutineWindow[] } | null>(null);
  const perRow = cellsPerRow(width, GAP);
  const rows = Array.from({ length: HOURS / perRow }, (_, r) =>
    Array.from({ length: perRow }, (_, c) => r * perRow + c),
  );

  const start = (hour: number, e: PointerEventLike) => {
    if (disabled) return;
    // Touch pointers are captured by the first cell; releasing lets the cells under the finger see it.
    const target = e.nativeEvent.target as PointerTarget | undefined;
    const id = e.nativeEvent.pointerId;
    if (id !== undefined && target?.hasPointerCapture?.(id)) target.releasePointerCapture?.(id);
    drag.current = { from: hour, on: !cells[hour], moved: false, base: windows };
  };
  const enter = (hour: number) => {
    const d = drag.current;
    if (!d || disabled || hour === d.from) return;
    d.moved = true;
    onChange(paintRange(d.base, strip, d.from, hour, d.on));
  };
  const end = () => {
    // Leave a moment for onPress to see that this gesture was a drag, not a tap.
    setTimeout(() => (drag.current = null), 0);
  };

  return (
    <View
      style={styles.grid}
      testID={testID}
      onLayout={(e) => setWidth(e.nativeEvent.layout.width)}
      onPointerUp={end}
      onPointerLeave={end}
      role="group"
      aria-label="Hours of the day"
    >
      {rows.map((row) => (
        <View key={row[0]} style={styles.row}>
          {row.map((hour) => {
            const on = cells[hour] === true;
            return (
              <Pressable
                key={hour}
                testID={`${testID}-cell-${hour}`}
                role="checkbox"
                aria-checked={on}
                accessibilityLabel={`${String(hour).padStart(2, '0')}:00 to ${String((hour + 1) % 24).padStart(2, '0')}:00, ${on ? 'runs' : 'off'}`}
                disabled={disabled}
                onPointerDown={(e) => start(hour, e)}
                onPointerEnter={() => enter(hour)}
                onPress={() => {
                  if (drag.current?.moved) return;
                  onChange(toggleCell(windows, strip, hour));
                }}
                style={[styles.cell, on ? styles.on : null, disabled ? styles.disabled : null]}
              >
                <Text variant="caption" color={on ? 'white' : 'inkSoft'}>
                  {String(hour).padStart(2, '0')}
                </Text>
              </Pressable>
            );
          })}
        </View>
      ))}
    </View>
  );
}

const GAP = space.xs;

const styles = StyleSheet.create({
  // touchAction none: a drag across the strip paints cells instead of scrolling the page.
  grid: { gap: GAP, touchAction: 'none', userSelect: 'none' } as object,
  row: { flexDirection: 'row', gap: GAP },
  cell: {
    flex: 1,
    minWidth: 0,
    minHeight: 48,
    borderRadius: radii.sm,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.white,
    alignItems: 'center',
    justifyContent: 'center',
  },
  on: { backgroundColor: colors.pine, borderColor: colors.pine },
  disabled: { opacity: 0.6 },
});
