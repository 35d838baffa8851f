import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { PASSWORD_HINT, signUpSchema, type SignUpInput } from '@/shared/schemas/account';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';
import { passwordProblemOf, usePasswordRulePreload } from '@/components/forms/password-rule';

type Props = {
  onSubmit: (values: SignUpInput) => Promise<void>;
  formError?: string;
  defaultEmail?: string;
  submitLabel?: string;
};

export function SignUpForm({ onSubmit, formError, defaultEmail = '', submitLabel }: Props) {
  const { control, handleSubmit, formState, setError } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: defaultEmail, password: '' },
  });
  usePasswordRulePreload();
  const submit = handleSubmit(async (values) => {
    const problem = await passwordProblemOf(values.password, values);
    if (problem) setError('password', { message: problem }, { shouldFocus: true });
    else await onSubmit(values);
  });
  return (
    <View style={styles.form}>
      {formError ? <Banner testID="sign-up-error" message={formError} /> : null}
      <FormTextField control={control} name="name" testID="sign-up-name" label="Your name" autoComplete="name" />
      <FormTextField
        control={control}
        name="email"
        testID="sign-up-email"
        label="E-mail"
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
      />
      <FormTextField
        control={control}
        name="password"
        testID="sign-up-password"
        label="Password"
        hint={PASSWORD_HINT}
        autoComplete="new-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button
        testID="sign-up-submit"
        label={submitLabel ?? 'Create account'}
        busy={formState.isSubmitting}
        onPress={submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
