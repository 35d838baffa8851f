// Building blocks shared by the rig form's sections: a number bound to a rig path (optionally shown in another
// unit), a titled section, a row of part presets and a disclosure for the figures most people never change.
import { useState, type ReactNode } from 'react';
import { Controller, useFormState, type Control, type FieldPathByValue } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { FieldSlot } from '@/components/forms/field-slot';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import type { Rig, RigInput } from '@/shared/schemas/rig';
import type { Shown } from './rig-form-values';

export type RigControl = Control<RigInput, unknown, Rig>;
export type NumPath = FieldPathByValue<RigInput, number | undefined>;

type NumProps = {
  control: RigControl;
  name: NumPath;
  label: string;
  unit?: string;
  testID: string;
  disabled: boolean;
  hint?: string;
  /** Shown in another unit than stored (percent of a fraction, °F of °C). */
  shown?: Shown;
  /** The schema's range in stored units: a refused figure then gets a message in the shown unit. */
  range?: [number, number];
  /** Left empty, the field is absent (the schema's optional) rather than a missing number. */
  optional?: boolean;
  /** A message that replaces the schema's for this field (for rules between two fields). */
  message?: string;
};

export function Num({
  control,
  name,
  label,
  unit,
  testID,
  disabled,
  hint,
  shown,
  range,
  optional = false,
  message,
}: NumProps) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const stored = typeof field.value === 'number' ? field.value : undefined;
        // The server's own words stand as they are; the form's refusals read in the shown unit.
        const error = !fieldState.error
          ? undefined
          : fieldState.error.type === 'server'
            ? fieldState.error.message
            : (message ?? (range ? (shown?.range ?? plainRange(unit))(range[0], range[1]) : fieldState.error.message));
        return (
          <FieldSlot fieldRef={field.ref} style={styles.cell}>
            <NumberField
              testID={testID}
              label={label}
              unit={shown?.unit ?? unit}
              hint={hint}
              editable={!disabled}
              value={stored === undefined || !shown ? stored : shown.show(stored)}
              onChangeNumber={(v) =>
                field.onChange(v === null ? (optional ? undefined : null) : shown ? shown.store(v) : v)
              }
              onBlur={field.onBlur}
              error={error}
            />
          </FieldSlot>
        );
      }}
    />
  );
}

const plainRange = (unit: string | undefined) => (min: number, max: number) =>
  `Enter a figure from ${min} to ${max}${unit ? ` ${unit}` : ''}.`;

export function Section({
  title,
  children,
  testID,
  right,
}: {
  title: string;
  children: ReactNode;
  testID: string;
  right?: ReactNode;
}) {
  return (
    <Card testID={testID}>
      <View style={styles.head}>
        <Text variant="title" role="heading" aria-level={2}>
          {title}
        </Text>
        {right}
      </View>
      {children}
    </Card>
  );
}

export function Presets({
  items,
  onPick,
  testID,
  disabled,
}: {
  items: { label: string }[];
  onPick: (i: number) => void;
  testID: string;
  disabled: boolean;
}) {
  if (disabled) return null;
  return (
    <View style={styles.presets}>
      <Text variant="caption" color="inkSoft">
        Common sizes:
      </Text>
      {items.map((item, i) => (
        <Button
          key={item.label}
          testID={`${testID}-${i}`}
          tone="quiet"
          label={item.label}
          accessibilityLabel={`Use ${item.label}`}
          onPress={() => onPick(i)}
        />
      ))}
    </View>
  );
}

/** Closed by default: these figures have sound defaults, and a phone screen is short. */
type AdvancedProps = {
  what: string;
  testID: string;
  /** The form and the fields inside: a refusal on one of them opens the disclosure, so it is seen and focusable. */
  control: RigControl;
  fields: readonly NumPath[];
  children: ReactNode;
};

export function Advanced({ what, testID, control, fields, children }: AdvancedProps) {
  const [open, setOpen] = useState(false);
  const { errors } = useFormState({ control, name: [...fields] });
  const refused = fields.some((field) => fieldError(errors, field));
  // Opened when a refusal arrives (not kept open by it: the person may close it again to read the rest).
  const [wasRefused, setWasRefused] = useState(refused);
  if (refused !== wasRefused) {
    setWasRefused(refused);
    if (refused) setOpen(true);
  }
  return (
    <View style={[styles.advanced, open ? styles.advancedOpen : null]}>
      <Button
        testID={testID}
        tone="quiet"
        style={styles.advancedToggle}
        label={`${open ? '▾' : '▸'} Advanced: ${what}`}
        accessibilityLabel={`Advanced: ${what}`}
        aria-expanded={open}
        onPress={() => setOpen(!open)}
      />
      {open ? <View style={styles.advancedBody}>{children}</View> : null}
    </View>
  );
}

/** Whether react-hook-form's error tree holds an error at a dotted path (`solarArrays.0.derate`). */
function fieldError(errors: object, path: string): boolean {
  let node: unknown = errors;
  for (const key of path.split('.')) {
    if (typeof node !== 'object' || node === null) return false;
    node = (node as Record<string, unknown>)[key];
  }
  return node !== undefined;
}

export const fieldStyles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
});

const styles = StyleSheet.create({
  head: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
  },
  // Basis 0 with a minimum width: equal columns that wrap to one per row on a phone.
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  presets: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  advanced: { borderRadius: radii.md, borderWidth: 1, borderColor: colors.line },
  advancedOpen: { backgroundColor: colors.dune },
  advancedToggle: { justifyContent: 'flex-start', paddingHorizontal: space.lg },
  advancedBody: { gap: space.md, paddingHorizontal: space.lg, paddingBottom: space.lg },
});
