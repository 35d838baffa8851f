import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { APPLIANCE_LIBRARY } from '@/shared/engine/appliance-library';
import type { ApplianceFields } from '@/shared/schemas/appliance';

export const BY_HAND: ApplianceFields = {
  name: '',
  circuit: 'dc',
  quantity: 1,
  runningW: 0,
  standbyW: 0,
  dutyCycle: 1,
  heatInputW: 0,
  schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 19, startMinute: 0, minutes: 60 }] },
};

export function fromLibrary(key: string): ApplianceFields | null {
  const i = APPLIANCE_LIBRARY.find((item) => item.key === key);
  if (!i) return null;
  return {
    name: i.name,
    circuit: i.circuit,
    quantity: 1,
    runningW: i.runningW,
    standbyW: i.standbyW,
    dutyCycle: i.dutyCycle,
    heatInputW: i.heatInputW,
    schedule: i.schedule,
    ...(i.surgeW === undefined ? {} : { surgeW: i.surgeW }),
  };
}

/** Start a new appliance from the library's typical figures, or from scratch. */
export function AddAppliance({ onPick }: { onPick: (fields: ApplianceFields) => void }) {
  return (
    <Card testID="add-appliance">
      <Text variant="title" role="heading" aria-level={2}>
        Add an appliance
      </Text>
      <Text variant="caption" color="inkSoft">
        Library figures are typical, not measured: check your appliance's label and adjust.
      </Text>
      <View style={styles.row}>
        {APPLIANCE_LIBRARY.map((item) => (
          <Button
            key={item.key}
            testID={`library-${item.key}`}
            tone="secondary"
            label={item.name}
            accessibilityLabel={`Add ${item.name} (${item.runningW} W, ${item.circuit.toUpperCase()})`}
            onPress={() => {
              const fields = fromLibrary(item.key);
              if (fields) onPick(fields);
            }}
            style={styles.item}
          />
        ))}
        <Button
          testID="library-by-hand"
          tone="quiet"
          label="By hand…"
          onPress={() => onPick(BY_HAND)}
          style={styles.item}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  item: { paddingHorizontal: space.lg },
});
