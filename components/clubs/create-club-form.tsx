import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';
import { createClubRequestSchema } from '@/shared/schemas/sharing';
import type { ClubSummary } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useClubCreateMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';

type Values = z.input<typeof createClubRequestSchema>;

export function CreateClubForm({ onCreated }: { onCreated: (club: ClubSummary) => void }) {
  const create = useClubCreateMutation();
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState, setError } = useForm<Values>({
    resolver: zodResolver(createClubRequestSchema),
    defaultValues: { name: '' },
  });
  const submit = handleSubmit(async ({ name }) => {
    setFormError(undefined);
    try {
      const { club } = await create.mutateAsync(name);
      showToast(`${club.name} is ready. Invite its households next.`);
      onCreated(club);
    } catch (error) {
      const fieldError = error instanceof ApiError ? error.fields?.name?.[0] : undefined;
      if (fieldError) setError('name', { message: fieldError });
      else setFormError(error instanceof ApiError ? error.message : 'That did not work. Please try again.');
    }
  });
  return (
    <View style={styles.form} testID="create-club-form">
      {formError ? <Banner testID="create-club-error" message={formError} /> : null}
      <FormTextField
        control={control}
        name="name"
        testID="create-club-name"
        label="Club name"
        placeholder="e.g. Lochside Tourers"
        onSubmitEditing={submit}
      />
      <Button
        testID="create-club-submit"
        label="Create club"
        busy={formState.isSubmitting}
        onPress={submit}
        style={styles.button}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md }, button: { alignSelf: 'flex-start' } });
