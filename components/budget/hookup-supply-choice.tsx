import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import { checkHookupSupply, hookupSupplyChoices, supplyKey } from '@/shared/engine/hookup-choice';
import type { Fix, FixCheck, Flag } from '@/shared/engine/result-types';
import type { HookupSupply } from '@/shared/hookup-supply';
import type { TripDetail } from '@/shared/schemas/api';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { useTripRecordQuery } from '@/stores/queries/weather';
import { withRecord } from './what-if';

// Re-checks keyed by their input, flag and supply: a re-render must not walk the battery again.
const checks = new Map<string, FixCheck | null>();

function recheck(input: EngineInputDraft | null, flag: Flag, stopIndex: number, supply: HookupSupply): FixCheck | null {
  if (!input) return null;
  const key = `${JSON.stringify(input)}|${flag.id}|${stopIndex}|${supplyKey(supply)}`;
  if (checks.has(key)) return checks.get(key) ?? null;
  let value: FixCheck | null;
  try {
    value = checkHookupSupply(input, flag, stopIndex, supply);
  } catch {
    value = null;
  }
  if (checks.size > 16) checks.clear();
  checks.set(key, value);
  return value;
}

const supplyLabel = (s: HookupSupply): string => `${s.amps} A · ${s.volts} V`;

/** The picked supply's check, in the words the fix list uses for its own fixes' checks. */
function checkWords(supply: HookupSupply, check: FixCheck | null): string {
  const what = `With ${supply.amps} A at ${supply.volts} V`;
  if (!check) return `${what}: could not be checked on this device.`;
  const lowest = `${check.lowestSocPct.toFixed(0)} %`;
  const verdict = check.clears ? 'clears this flag' : 'helps, not enough alone';
  if (!check.years) return `${what}: ${verdict} (lowest charge ${lowest}), checked on this device.`;
  const { held, of } = check.years;
  return `${what}: ${verdict}: holds in ${held} of ${of} past years (lowest ${lowest} in a bad year), checked on this device.`;
}

type Props = {
  detail: TripDetail;
  flag: Flag;
  fix: Fix;
  testID: string;
  value: HookupSupply | null;
  onChange: (supply: HookupSupply | null) => void;
};

/** The supply a hookup fix books: the one usual in the stop's country, or another the traveller picks. */
export function HookupSupplyChoice({ detail, flag, fix, testID, value, onChange }: Props) {
  const [open, setOpen] = useState(false);
  const record = useTripRecordQuery(detail, true);
  const stopIndex = typeof fix.params.stopIndex === 'number' ? fix.params.stopIndex : -1;
  const stop = detail.stops[stopIndex];
  const offered =
    typeof fix.params.amps === 'number' && typeof fix.params.volts === 'number'
      ? { amps: fix.params.amps, volts: fix.params.volts }
      : null;
  if (!stop || !offered) return null;
  const chosen = value ?? offered;
  const other = supplyKey(chosen) !== supplyKey(offered);
  const choices = hookupSupplyChoices(stop.stop.timeZone);
  // Checked against the recorded years the fix list was checked against, when the trip has them.
  const input = other ? withRecord(toEngineInput(detail), record.data?.weather) : null;
  return (
    <View style={styles.wrap}>
      {open ? (
        <ChoiceChips
          label={`Supply at ${stop.stop.name}`}
          testID={testID}
          options={choices.map((s) => ({ value: supplyKey(s), label: supplyLabel(s) }))}
          value={supplyKey(chosen)}
          onChange={(key) => {
            const s = choices.find((c) => supplyKey(c) === key) ?? null;
            onChange(s && supplyKey(s) !== supplyKey(offered) ? s : null);
          }}
        />
      ) : (
        <Button
          testID={`${testID}-open`}
          tone="quiet"
          style={styles.open}
          label="▸ Pick another supply"
          accessibilityLabel={`Pick another hookup supply at ${stop.stop.name}`}
          aria-expanded={false}
          onPress={() => setOpen(true)}
        />
      )}
      {other ? (
        <Text variant="caption" testID={`${testID}-check`} role="status">
          {record.isPending && record.fetchStatus === 'fetching'
            ? 'Checking this supply…'
            : checkWords(chosen, recheck(input, flag, stopIndex, chosen))}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  // Starts under the fix's words, like the fix's other text, not centred across the card.
  open: { alignSelf: 'flex-start', paddingHorizontal: 0, minHeight: 44 },
});
