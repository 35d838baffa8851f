import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { describeAuthError } from '@/components/forms/auth-error';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';
import { PASSWORD_MIN_LENGTH, signUpSchema } from '@/shared/schemas/account';
import { authClient } from '@/stores/auth-client';

const resetSchema = z
  .object({ newPassword: signUpSchema.shape.password, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { message: 'The two passwords differ.', path: ['repeat'] });
type ResetInput = z.infer<typeof resetSchema>;

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState } = useForm<ResetInput>({
    resolver: zodResolver(resetSchema),
    defaultValues: { newPassword: '', repeat: '' },
  });
  const submit = handleSubmit(async ({ newPassword }) => {
    setFormError(undefined);
    try {
      const { error } = await authClient.resetPassword({ newPassword, token });
      if (!error) return onDone();
      setFormError(
        error.status === 400
          ? 'This reset link has expired or was already used. Ask for a new one.'
          : describeAuthError(error),
      );
    } catch {
      setFormError(describeAuthError({}));
    }
  });
  return (
    <View style={styles.form}>
      {formError ? <Banner testID="reset-error" message={formError} /> : null}
      <FormTextField
        control={control}
        name="newPassword"
        testID="reset-password"
        label="New password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        autoComplete="new-password"
        secureTextEntry
      />
      <FormTextField
        control={control}
        name="repeat"
        testID="reset-repeat"
        label="New password again"
        autoComplete="new-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button testID="reset-submit" label="Save new password" busy={formState.isSubmitting} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
