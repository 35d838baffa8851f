import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Skeleton } from '@/components/ui/skeleton';
import { TextField } from '@/components/ui/text-field';
import type { SavedRigRecord } from '@/shared/schemas/api';
import type { RigInput } from '@/shared/schemas/rig';
import { ApiError } from '@/stores/queries/api-client';
import { useRigCreateMutation, useRigPresetsQuery } from '@/stores/queries/rigs';

/** A blank rig: a 100 Ah lithium battery and nothing else, for someone who will enter their own parts. */
export const BLANK_RIG: RigInput = {
  name: 'My rig',
  battery: { chemistry: 'lifepo4', capacityAh: 100, nominalV: 12.8 },
};

type Props = { testID: string; onCreated: (record: SavedRigRecord) => void; submitLabel?: string };

/** Starts one of My rigs from a common rig or blank; its parts and usual loads are edited afterwards. */
export function NewRigForm({ testID, onCreated, submitLabel = 'Create rig' }: Props) {
  const presets = useRigPresetsQuery();
  const create = useRigCreateMutation();
  const [start, setStart] = useState('blank');
  const [name, setName] = useState('');
  const [error, setError] = useState<string>();
  const [nameError, setNameError] = useState<string>();
  if (presets.isPending) return <Skeleton testID={`${testID}-loading`} height={96} />;
  const preset = presets.data?.presets.find((p) => p.id === start);
  const submit = async () => {
    setError(undefined);
    setNameError(undefined);
    const base = preset?.rig ?? BLANK_RIG;
    try {
      onCreated(await create.mutateAsync({ rig: { ...base, name: name.trim() || base.name } }));
    } catch (failure) {
      const nameRefusal = failure instanceof ApiError ? failure.fields?.['rig.name'] : undefined;
      if (nameRefusal) setNameError(nameRefusal.join(' '));
      else setError(failure instanceof ApiError ? failure.message : 'The rig could not be created.');
    }
  };
  return (
    <View style={styles.form} testID={testID}>
      <ChoiceChips
        testID={`${testID}-start`}
        label="Start from"
        value={start}
        onChange={setStart}
        options={[
          ...(presets.data?.presets ?? []).map((p) => ({ value: p.id, label: p.label })),
          { value: 'blank', label: 'Blank (enter my own parts)' },
        ]}
      />
      <TextField
        testID={`${testID}-name`}
        label="Rig name"
        hint={`Left empty: “${preset?.rig.name ?? BLANK_RIG.name}”`}
        value={name}
        onChangeText={setName}
        error={nameError}
        maxLength={120}
      />
      {error ? <Banner testID={`${testID}-error`} message={error} /> : null}
      <Button
        testID={`${testID}-submit`}
        label={submitLabel}
        busy={create.isPending}
        style={styles.left}
        onPress={() => void submit()}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md }, left: { alignSelf: 'flex-start' } });
