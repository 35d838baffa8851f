import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { findHeadroom } from '@/shared/engine';
import type { HeadroomLever, HeadroomResult } from '@/shared/engine/headroom';
import { cheapestLever } from '@/shared/engine/lever-cost';
import { headroomAim, leverLine } from './headroom-lines';
import type { TripDetail } from '@/shared/schemas/api';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import type { EngineWeather } from '@/shared/schemas/engine-weather';
import { useTripRecordQuery } from '@/stores/queries/weather';
import { withRecord } from './what-if';

const LEVER_NAMES: Record<HeadroomLever['lever'], string> = {
  battery: 'Extra battery',
  solar: 'Extra solar',
  generator: 'Generator time',
  hookup: 'Hookup nights',
};

// The last search, keyed by its input: a re-render must not search again (a few battery walks per lever).
let last: { key: string; value: HeadroomResult | null } | null = null;

function headroomFor(detail: TripDetail, weather: EngineWeather | null | undefined): HeadroomResult | null {
  const input = withRecord(toEngineInput(detail), weather);
  if (!input) return null;
  const key = JSON.stringify(input);
  if (last?.key === key) return last.value;
  let value: HeadroomResult | null;
  try {
    value = findHeadroom(input);
  } catch {
    value = null;
  }
  last = { key, value };
  return value;
}

/** The headroom finder on screen: the smallest of each lever that keeps the whole trip above the reserve. */
export function WhatItWouldTake({ detail }: { detail: TripDetail }) {
  const record = useTripRecordQuery(detail, true);
  const headroom =
    record.isPending && record.fetchStatus === 'fetching' ? null : headroomFor(detail, record.data?.weather);
  if (!headroom) return null;
  const cheapest = cheapestLever(headroom);
  return (
    <Card testID="what-it-would-take">
      <Text variant="title" role="heading" aria-level={2}>
        What it would take
      </Text>
      {!headroom.needed ? (
        <Text color="pine" testID="what-it-would-take-none">
          {headroomAim(headroom)}
        </Text>
      ) : (
        <>
          <Text variant="caption" color="inkSoft">
            {headroomAim(headroom)}
          </Text>
          {headroom.levers.map((l) => {
            const line = leverLine(l);
            const isCheapest = l.lever === cheapest;
            return (
              <View
                key={l.lever}
                style={[styles.lever, isCheapest ? styles.cheapestLever : null]}
                testID={`what-it-would-take-${l.lever}`}
              >
                <View style={styles.nameRow}>
                  <Text variant="label">{LEVER_NAMES[l.lever]}</Text>
                  {isCheapest ? (
                    // Words, not only a colour: a screen reader reads "cheapest" with the lever's name.
                    <Text
                      variant="caption"
                      color="white"
                      style={styles.badge}
                      testID="what-it-would-take-cheapest"
                      accessibilityLabel="cheapest of these levers"
                    >
                      Cheapest
                    </Text>
                  ) : null}
                </View>
                <Text variant="caption" color={line.tone}>
                  {line.text}
                </Text>
              </View>
            );
          })}
          {cheapest ? (
            <Text variant="caption" color="inkSoft" testID="what-it-would-take-cheapest-basis">
              Cheapest by a rough outlay for this trip at common US prices: battery about $0.30 per Wh, solar $1.50 per
              W, generator $1 an hour ($600 more to buy one), a powered site $20 a night more than an unpowered one.
            </Text>
          ) : null}
        </>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  lever: {
    padding: space.sm,
    borderRadius: radii.sm,
    backgroundColor: colors.dune,
    gap: 2,
    borderWidth: 2,
    borderColor: 'transparent',
  },
  cheapestLever: { borderColor: colors.pine, backgroundColor: colors.pineSoft },
  nameRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  badge: {
    backgroundColor: colors.pine,
    borderRadius: radii.pill,
    paddingHorizontal: space.sm,
    overflow: 'hidden',
  },
});
