import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { describeAuthError } from '@/components/forms/auth-error';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';
import { signInSchema } from '@/shared/schemas/account';
import { authClient } from '@/stores/auth-client';

const forgotSchema = signInSchema.pick({ email: true });
type ForgotInput = z.infer<typeof forgotSchema>;

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string>();
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState } = useForm<ForgotInput>({
    resolver: zodResolver(forgotSchema),
    defaultValues: { email: '' },
  });
  const submit = handleSubmit(async ({ email }) => {
    setFormError(undefined);
    try {
      const { error } = await authClient.requestPasswordReset({
        email,
        redirectTo: `${window.location.origin}/reset-password`,
      });
      if (error) return setFormError(describeAuthError(error));
      setSentTo(email);
    } catch {
      setFormError(describeAuthError({}));
    }
  });
  if (sentTo)
    return (
      <Banner
        testID="forgot-sent"
        tone="info"
        message={`If ${sentTo} has a Trailtally account, a link to choose a new password is on its way. It works for one hour.`}
      />
    );
  return (
    <View style={styles.form}>
      {formError ? <Banner testID="forgot-error" message={formError} /> : null}
      <FormTextField
        control={control}
        name="email"
        testID="forgot-email"
        label="E-mail"
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      <Button testID="forgot-submit" label="Send me a reset link" busy={formState.isSubmitting} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
