import { useState } from 'react';
import { Platform, StyleSheet, View, type ViewStyle } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Caution } from '@/components/ui/cautions';
import { Text } from '@/components/ui/text';
import { withFixes } from '@/shared/engine/check-fixes';
import type { DaySheet, Fix, Flag } from '@/shared/engine/result-types';
import { momentText } from '@/shared/engine/flag-text';
import { hasMoment } from '@/shared/engine/flags';
import { flagTitle } from '@/shared/flag-titles';
import type { TripDetail } from '@/shared/schemas/api';
import type { HookupSupply } from '@/shared/hookup-supply';
import { QueryError } from '@/components/ui/query-error';
import { editForFix, type FixChoice } from './apply-fix';
import { HookupSupplyChoice } from './hookup-supply-choice';
import type { FixesView } from './use-flag-fixes';

type Props = {
  flags: Flag[];
  /** The flags' checked fixes: they arrive after the flags (see use-flag-fixes.ts). */
  fixes: FixesView;
  days: DaySheet[];
  detail: TripDetail;
  canEdit: boolean;
  readOnlyReason?: string;
  busyKey: string | null;
  onApply: (key: string, fix: Fix, choice: FixChoice) => void;
};

export function FlagList({ flags: bare, fixes, days, detail, canEdit, readOnlyReason, busyKey, onApply }: Props) {
  const flags = withFixes(bare, fixes.state === 'ready' || fixes.state === 'rechecking' ? fixes.fixes : []);
  // A held fix belongs to the plan before the last edit: shown so the list keeps its place, applied only once checked.
  const stale = fixes.state === 'rechecking';
  const where = (f: Flag) =>
    f.where.kind === 'stop'
      ? (detail.stops[f.where.stopIndex]?.stop.name ?? `stop ${f.where.stopIndex + 1}`)
      : `drive ${f.where.driveIndex + 1}`;
  // A hookup fix's supply picked by the traveller, by fix key; absent means the one the engine offered.
  const [supplies, setSupplies] = useState<Record<string, HookupSupply>>({});
  const hasGeneratorFix = flags.some((f) => f.fixes.some((x) => x.kind === 'add-generator-hours'));
  return (
    <Card testID="flag-list" style={noScrollAnchor}>
      <Text variant="title" role="heading" aria-level={2}>
        Flags {flags.length > 0 ? `(${flags.length})` : ''}
      </Text>
      {flags.length === 0 ? (
        <Text color="pine" testID="flags-none">
          No flags: the plan stays above the reserve all trip.
        </Text>
      ) : null}
      {flags.length > 0 && fixes.state !== 'ready' ? <FixesPending fixes={fixes} /> : null}
      {flags.map((flag, n) => (
        <View
          key={flag.id}
          style={[
            styles.flag,
            flag.severity === 'danger' ? styles.danger : flag.severity === 'warning' ? styles.warning : styles.info,
          ]}
          testID={`flag-${flag.id}`}
        >
          <View style={styles.titleRow}>
            {/* The same number marks the flag on the state-of-charge chart. */}
            <View style={[styles.number, flag.severity === 'danger' ? styles.numberDanger : null]}>
              <Text variant="caption" color={flag.severity === 'danger' ? 'white' : 'ink'}>
                {n + 1}
              </Text>
            </View>
            <Text variant="label" color={flag.severity === 'danger' ? 'ember' : 'ink'} style={styles.title}>
              {flagTitle(flag)}
            </Text>
          </View>
          <Text variant="caption" color="inkSoft">
            {hasMoment(flag) ? `${momentText(flag.atLocal)} at ` : ''}
            {where(flag)}
          </Text>
          <Text>{flag.cause}</Text>
          {flag.fixes.map((fix, i) => {
            const key = `${flag.id}-${i}`;
            const supply = supplies[key];
            const choice: FixChoice = supply ? { supply } : {};
            const edit = canEdit ? editForFix(detail, fix, days, choice) : null;
            return (
              <View key={key} style={styles.fixBlock}>
                <View style={styles.fix}>
                  <Text variant="caption" style={styles.fixText}>
                    Fix: {fix.text}
                  </Text>
                  {edit ? (
                    <Button
                      testID={`fix-${flag.id}-${i}`}
                      tone="secondary"
                      label="Apply"
                      accessibilityLabel={`Apply fix: ${edit.summary}`}
                      busy={busyKey === key}
                      disabled={busyKey !== null || stale}
                      onPress={() => onApply(key, fix, choice)}
                    />
                  ) : null}
                </View>
                {/* Under its fix, so the Apply beside the fix's words books the supply picked here. */}
                {edit && fix.kind === 'add-hookup-night' ? (
                  <HookupSupplyChoice
                    detail={detail}
                    flag={flag}
                    fix={fix}
                    testID={`hookup-supply-${flag.id}-${i}`}
                    value={supply ?? null}
                    onChange={(s) => setSupplies(({ [key]: _dropped, ...rest }) => (s ? { ...rest, [key]: s } : rest))}
                  />
                ) : null}
              </View>
            );
          })}
        </View>
      ))}
      {!canEdit && flags.length > 0 && readOnlyReason ? (
        <Text variant="caption" color="inkSoft">
          {readOnlyReason}
        </Text>
      ) : null}
      {hasGeneratorFix ? <Caution kind="generator" testID="caution-generator-fix" /> : null}
    </Card>
  );
}

/** "Checking fixes…" while they are worked out, or what went wrong with a way to try again. */
function FixesPending({ fixes }: { fixes: FixesView }) {
  if (fixes.state === 'error') return <QueryError testID="fixes-error" error={fixes.error} onRetry={fixes.retry} />;
  return (
    <Text variant="caption" color="inkSoft" testID="fixes-loading" role="status">
      {fixes.state === 'rechecking' ? 'Checking the fixes again for the plan as it is now…' : 'Checking fixes…'}
    </Text>
  );
}

/**
 * Applying or undoing a fix adds and removes flags here. A browser keeps its scroll anchor (a node it picked on the
 * screen) still when the content above it changes, and an anchor picked inside this list made the tab jump by a
 * flag's height; kept out of the choice, the list grows and shrinks below what the reader sees.
 */
const noScrollAnchor: ViewStyle | undefined =
  Platform.OS === 'web' ? ({ overflowAnchor: 'none' } as unknown as ViewStyle) : undefined;

const styles = StyleSheet.create({
  flag: { borderLeftWidth: 4, borderRadius: radii.sm, padding: space.md, gap: space.xs, backgroundColor: colors.dune },
  danger: { borderLeftColor: colors.ember },
  warning: { borderLeftColor: colors.sunlit },
  info: { borderLeftColor: colors.lake },
  fixBlock: { gap: space.xs },
  fix: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, justifyContent: 'space-between' },
  fixText: { flex: 1, minWidth: 160 },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  title: { flex: 1 },
  number: {
    minWidth: 22,
    height: 22,
    borderRadius: 11,
    paddingHorizontal: space.xs,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.sunlit,
  },
  numberDanger: { backgroundColor: colors.emberInk },
});
