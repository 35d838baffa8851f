import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { DateTimeField } from '@/components/ui/date-time-field';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { timeZoneSchema } from '@/shared/schemas/common';
import { fieldsSound, RUN_WITH_OTHER_ERRORS } from '@/shared/schemas/cross-field';
import { createTripRequestSchema, type CreateTripRequest, type TripDetail } from '@/shared/schemas/api';
import { useMyRigsQuery, useRigPresetsQuery } from '@/stores/queries/rigs';
import { useTripCreateMutation } from '@/stores/queries/trips';
import { FieldSlot } from './field-slot';
import { FormTextField } from './form-text-field';
import { showServerRefusal } from './server-refusal';
import { ZoneField } from './zone-field';

// The form holds the rig choice as one string ("preset:id" or "saved:id") so a single chip group can pick it.
const formSchema = z
  .object({
    name: z.string().trim().min(1, { error: 'Give the trip a name.' }).max(120),
    startDate: z.iso.date({ error: 'Choose the first day.' }),
    endDate: z.iso.date({ error: 'Choose the last day.' }),
    timeZone: timeZoneSchema,
    rig: z.string().regex(/^(preset|saved):.+/, { error: 'Choose a rig to start from.' }),
  })
  .superRefine((v, ctx) => {
    if (fieldsSound(ctx, 'startDate', 'endDate') && v.endDate < v.startDate)
      ctx.addIssue({ code: 'custom', path: ['endDate'], message: 'The trip must end on or after its first day.' });
  }, RUN_WITH_OTHER_ERRORS);
type FormValues = z.infer<typeof formSchema>;
const FIELD_ORDER: readonly (keyof FormValues)[] = ['name', 'startDate', 'endDate', 'timeZone', 'rig'];
/** The form field that shows an API field: the rig source is the rig chips, the rest keep their names. */
const fieldOf = (apiField: string): keyof FormValues | undefined => {
  const first = apiField.split('.')[0];
  if (first === 'rigSource') return 'rig';
  return FIELD_ORDER.find((field) => field === first);
};

function toRequest(v: FormValues): CreateTripRequest {
  const [kind, id] = [v.rig.slice(0, v.rig.indexOf(':')), v.rig.slice(v.rig.indexOf(':') + 1)];
  return createTripRequestSchema.parse({
    name: v.name,
    startDate: v.startDate,
    endDate: v.endDate,
    timeZone: v.timeZone,
    notes: '',
    rigSource: kind === 'saved' ? { kind: 'saved', rigId: id } : { kind: 'preset', presetId: id },
  });
}

const browserZone = (): string => {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  } catch {
    return 'UTC';
  }
};

export function NewTripForm({ onCreated }: { onCreated: (detail: TripDetail) => void }) {
  const presets = useRigPresetsQuery();
  const mine = useMyRigsQuery();
  const create = useTripCreateMutation();
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState, setError } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { name: '', startDate: '', endDate: '', timeZone: browserZone(), rig: '' },
  });
  const submit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      onCreated(await create.mutateAsync(toRequest(values)));
    } catch (error) {
      setFormError(
        showServerRefusal(error, { order: FIELD_ORDER, fieldOf, setError, fallback: 'The trip could not be created.' }),
      );
    }
  });
  const rigOptions = [
    ...(mine.data?.rigs ?? []).map((r) => ({ value: `saved:${r.id}`, label: r.rig.name })),
    ...(presets.data?.presets ?? []).map((p) => ({ value: `preset:${p.id}`, label: p.label })),
  ];
  const day = (name: 'startDate' | 'endDate', label: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref} style={styles.cell}>
          <DateTimeField
            kind="date"
            testID={`new-trip-${name}`}
            label={label}
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );
  return (
    <View style={styles.form} testID="new-trip-form">
      <FormTextField control={control} name="name" testID="new-trip-name" label="Trip name" onSubmitEditing={submit} />
      <View style={styles.grid}>
        {day('startDate', 'First day')}
        {day('endDate', 'Last day')}
      </View>
      <Controller
        control={control}
        name="timeZone"
        render={({ field, fieldState }) => (
          <FieldSlot fieldRef={field.ref}>
            <ZoneField
              testID="new-trip-timeZone"
              label="Home time zone"
              value={field.value}
              onChange={field.onChange}
              error={fieldState.error?.message}
            />
          </FieldSlot>
        )}
      />
      {presets.isPending || mine.isPending ? <Skeleton testID="new-trip-rigs-loading" height={96} /> : null}
      <Controller
        control={control}
        name="rig"
        render={({ field, fieldState }) => (
          <FieldSlot fieldRef={field.ref} style={styles.rig}>
            <ChoiceChips
              testID="new-trip-rig"
              label="Start from a rig (My rigs first, then common rigs)"
              value={field.value}
              onChange={field.onChange}
              options={rigOptions}
            />
            {fieldState.error ? (
              <Text variant="caption" color="ember" role="alert">
                {fieldState.error.message}
              </Text>
            ) : null}
          </FieldSlot>
        )}
      />
      {formError ? <Banner testID="new-trip-error" message={formError} /> : null}
      <Button
        testID="new-trip-submit"
        label="Create trip"
        busy={formState.isSubmitting}
        disabled={formState.isSubmitting}
        onPress={submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 160 },
  rig: { gap: space.xs },
});
