import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AddAppliance } from '@/components/loads/add-appliance';
import { rowStyles } from '@/components/theme/rows';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { SavedRigRecord } from '@/shared/schemas/api';
import { applianceFieldsSchema, type ApplianceFields } from '@/shared/schemas/appliance';
import { ApiError } from '@/stores/queries/api-client';
import { useRigLoadsMutation } from '@/stores/queries/rigs';

type ByHandErrors = Partial<Record<'name' | 'runningW', string>>;

/** A load typed by hand: its name, its watts and its circuit; it runs in the evening until changed on a trip. */
function ByHandLoad({ onAdd, onCancel }: { onAdd: (fields: ApplianceFields) => void; onCancel: () => void }) {
  const [name, setName] = useState('');
  const [watts, setWatts] = useState<number | null>(null);
  const [circuit, setCircuit] = useState<'dc' | 'ac'>('dc');
  const [errors, setErrors] = useState<ByHandErrors>({});
  const add = () => {
    const parsed = applianceFieldsSchema.safeParse({
      name,
      circuit,
      runningW: watts,
      schedule: { kind: 'routine', windows: [{ startHour: 19, minutes: 120 }] },
    });
    if (parsed.success) return onAdd(parsed.data);
    const found: ByHandErrors = {};
    for (const issue of parsed.error.issues) {
      const field = issue.path[0];
      if ((field === 'name' || field === 'runningW') && !found[field]) found[field] = issue.message;
    }
    setErrors(found);
  };
  return (
    <View style={styles.byHand} testID="rig-load-by-hand">
      <View style={styles.grid}>
        <View style={styles.cell}>
          <TextField testID="rig-load-name" label="Name" value={name} onChangeText={setName} error={errors.name} />
        </View>
        <View style={styles.cell}>
          <NumberField
            testID="rig-load-watts"
            label="Running"
            unit="W"
            value={watts}
            onChangeNumber={setWatts}
            error={errors.runningW}
          />
        </View>
      </View>
      <ChoiceChips
        testID="rig-load-circuit"
        label="Circuit"
        value={circuit}
        onChange={setCircuit}
        options={[
          { value: 'dc', label: 'DC' },
          { value: 'ac', label: 'AC' },
        ]}
      />
      <View style={styles.actions}>
        <Button testID="rig-load-add" label="Add to this rig" onPress={add} />
        <Button testID="rig-load-cancel" label="Cancel" tone="quiet" onPress={onCancel} />
      </View>
    </View>
  );
}

/**
 * The rig's usual loads: what the household runs on every trip. Each change is saved at once; a trip made on the
 * rig starts with these, and its own Loads tab sets when each runs.
 */
export function RigLoadsEditor({ record }: { record: SavedRigRecord }) {
  const save = useRigLoadsMutation(record.id);
  // The newest of what the server last answered and what the list holds: quick changes in a row name the right
  // version even before the list is read again.
  const [latest, setLatest] = useState(record);
  const current = latest.version >= record.version ? latest : record;
  const [byHand, setByHand] = useState(false);
  const [error, setError] = useState<string>();
  const change = async (loads: ApplianceFields[], done: string) => {
    setError(undefined);
    try {
      setLatest(await save.mutateAsync({ version: current.version, loads }));
      setByHand(false);
      return done;
    } catch (failure) {
      setError(failure instanceof ApiError ? failure.message : 'The loads could not be saved.');
      return undefined;
    }
  };
  return (
    <View style={styles.wrap}>
      <Card testID="rig-loads">
        <Text variant="title" role="heading" aria-level={2}>
          Usual loads
        </Text>
        <Text variant="caption" color="inkSoft">
          What you run on every trip. A trip or a club plan copied onto this rig starts with these.
        </Text>
        {current.loads.length === 0 ? (
          <Text color="inkSoft" testID="rig-loads-empty">
            None yet: add them below.
          </Text>
        ) : (
          current.loads.map((load, i) => (
            <View key={`${load.name}-${i}`} style={rowStyles.wrapping} testID={`rig-load-${i}`}>
              <View style={rowStyles.text}>
                <Text variant="label">{load.name}</Text>
                <Text variant="caption" color="inkSoft">
                  {load.runningW} W · {load.circuit.toUpperCase()}
                </Text>
              </View>
              <Button
                testID={`rig-load-${i}-remove`}
                tone="quiet"
                label="Remove"
                accessibilityLabel={`Remove ${load.name}`}
                onPress={() =>
                  void change(
                    current.loads.filter((_, j) => j !== i),
                    `${load.name} removed`,
                  )
                }
              />
            </View>
          ))
        )}
        {error ? <Banner testID="rig-loads-error" message={error} /> : null}
        {byHand ? (
          <ByHandLoad
            onAdd={(fields) => void change([...current.loads, fields], 'added')}
            onCancel={() => setByHand(false)}
          />
        ) : null}
      </Card>
      <AddAppliance
        onPick={(fields) =>
          fields.name === '' ? setByHand(true) : void change([...current.loads, fields], `${fields.name} added`)
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  byHand: { gap: space.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
