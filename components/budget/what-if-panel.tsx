import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import { useBudgetQuery } from '@/stores/queries/budget';
import { anyWhatIf, clearWhatIf, toggleWhatIf, useWhatIf, type WhatIfKey } from '@/stores/what-if-store';
import type { FixEdit } from './apply-fix';
import { rigWithExtraBattery, rigWithExtraSolar, stopWithoutHookup, stopWithWorseSky, WHAT_IF_LABELS } from './what-if';

const KEYS: WhatIfKey[] = ['extraBattery', 'extraSolar', 'skipHookup', 'worseSky'];

/** The saved edits that make a what-if real. */
export function editsForWhatIf(detail: TripDetail, key: WhatIfKey): FixEdit[] {
  const rig = detail.rig.rig;
  switch (key) {
    case 'extraBattery':
      return [{ kind: 'rig', rig: rigWithExtraBattery(rig), summary: 'battery × 1.5' }];
    case 'extraSolar':
      return [{ kind: 'rig', rig: rigWithExtraSolar(rig), summary: 'more solar' }];
    case 'skipHookup':
      return detail.stops
        .filter((r) => r.stop.hookup !== null)
        .map((r) => ({
          kind: 'stop' as const,
          record: r,
          stop: stopWithoutHookup(r.stop) as TripDetail['stops'][number]['stop'],
          summary: `no hookup at ${r.stop.name}`,
        }));
    case 'worseSky':
      return detail.stops.map((r) => ({
        kind: 'stop' as const,
        record: r,
        stop: stopWithWorseSky(r.stop) as TripDetail['stops'][number]['stop'],
        summary: `sky at ${r.stop.name}`,
      }));
  }
}

type Props = {
  detail: TripDetail;
  canEdit: boolean;
  busyKey: string | null;
  onKeep: (key: WhatIfKey) => void;
  lowestNow?: number;
};

export function WhatIfPanel({ detail, canEdit, busyKey, onKeep, lowestNow }: Props) {
  const saved = useBudgetQuery(detail.trip.id).data?.result?.headline.lowestSocPct;
  const tripId = detail.trip.id;
  const whatIf = useWhatIf(tripId);
  const active = anyWhatIf(whatIf);
  return (
    <Card testID="what-if-panel" style={active ? styles.activeCard : null}>
      <View style={styles.head}>
        <Text variant="title" role="heading" aria-level={2}>
          What if…
        </Text>
        {active ? (
          <View style={styles.badge} testID="what-if-unsaved">
            <Text variant="caption" color="white">
              Unsaved
            </Text>
          </View>
        ) : null}
      </View>
      <Text variant="caption" color="inkSoft">
        Try a change here; the budget above recomputes at once in your browser. Nothing is saved until you keep it.
      </Text>
      {KEYS.map((key) => {
        const on = whatIf[key];
        const { label, hint } = WHAT_IF_LABELS[key];
        return (
          <View key={key} style={styles.row}>
            <Pressable
              testID={`what-if-${key}`}
              role="switch"
              aria-checked={on}
              accessibilityLabel={`${label} (${hint})`}
              onPress={() => toggleWhatIf(tripId, key)}
              style={[styles.toggle, on ? styles.toggleOn : null]}
            >
              <View style={[styles.knob, on ? styles.knobOn : null]} />
              <View style={styles.toggleText}>
                <Text variant="label">{label}</Text>
                <Text variant="caption" color="inkSoft">
                  {hint}
                </Text>
              </View>
            </Pressable>
            {on && canEdit ? (
              <Button
                testID={`what-if-keep-${key}`}
                label="Keep this change"
                tone="primary"
                busy={busyKey === `keep-${key}`}
                disabled={busyKey !== null}
                onPress={() => onKeep(key)}
              />
            ) : null}
          </View>
        );
      })}
      {active && lowestNow !== undefined ? (
        // Repeated here because on a phone the headline figures are far above this panel.
        <Text variant="label" testID="what-if-result" aria-live="polite">
          Lowest charge with these changes: {Math.round(lowestNow)}%
          {saved !== undefined ? ` (saved plan: ${Math.round(saved)}%)` : ''}
        </Text>
      ) : null}
      {active ? (
        <Button testID="what-if-discard" label="Discard what-ifs" tone="quiet" onPress={() => clearWhatIf(tripId)} />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  activeCard: { borderColor: colors.sunlit, borderWidth: 2 },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  badge: {
    backgroundColor: colors.emberInk,
    borderRadius: radii.pill,
    paddingHorizontal: space.sm,
    paddingVertical: 2,
  },
  row: { gap: space.sm },
  toggle: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: 52,
    padding: space.sm,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
  },
  toggleOn: { borderColor: colors.pine, backgroundColor: colors.pineSoft },
  toggleText: { flex: 1 },
  knob: { width: 22, height: 22, borderRadius: 11, borderWidth: 2, borderColor: colors.mist },
  knobOn: { backgroundColor: colors.pine, borderColor: colors.pine },
});
