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
import { passwordProblemOf, usePasswordRulePreload } from '@/components/forms/password-rule';
import { PASSWORD_HINT, signUpSchema } from '@/shared/schemas/account';
import { authClient } from '@/stores/auth-client';

const resetSchema = z
  .object({ newPassword: signUpSchema.shape.password, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { message: 'The two passwords differ.', path: ['repeat'] });
type ResetInput = z.infer<typeof resetSchema>;

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState, setError } = useForm<ResetInput>({
    resolver: zodResolver(resetSchema),
    defaultValues: { newPassword: '', repeat: '' },
  });
  usePasswordRulePreload();
  const submit = handleSubmit(async ({ newPassword }) => {
    setFormError(undefined);
    // The address is not known on this page; the server also refuses the account's own address.
    const problem = await passwordProblemOf(newPassword, {});
    if (problem) {
      setError('newPassword', { message: problem }, { shouldFocus: true });
      return;
    }
    try {
      const { error } = await authClient.resetPassword({ newPassword, token });
      if (!error) return onDone();
      setFormError(
        error.code === 'INVALID_TOKEN'
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
        hint={PASSWORD_HINT}
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
