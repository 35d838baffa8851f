import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { signInSchema, type SignInInput } from '@/shared/schemas/account';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';

type Props = {
  onSubmit: (values: SignInInput) => Promise<void>;
  formError?: string;
  defaultEmail?: string;
  submitLabel?: string;
};

export function SignInForm({ onSubmit, formError, defaultEmail = '', submitLabel }: Props) {
  const { control, handleSubmit, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });
  const submit = handleSubmit(onSubmit);
  return (
    <View style={styles.form}>
      {formError ? <Banner testID="sign-in-error" message={formError} /> : null}
      <FormTextField
        control={control}
        name="email"
        testID="sign-in-email"
        label="E-mail"
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        onSubmitEditing={submit}
      />
      <FormTextField
        control={control}
        name="password"
        testID="sign-in-password"
        label="Password"
        autoComplete="current-password"
        secureTextEntry
        onSubmitEditing={submit}
      />
      <Button testID="sign-in-submit" label={submitLabel ?? 'Sign in'} busy={formState.isSubmitting} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
