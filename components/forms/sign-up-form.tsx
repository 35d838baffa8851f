import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { PASSWORD_MIN_LENGTH, signUpSchema, type SignUpInput } from '@/shared/schemas/account';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';

type Props = {
  onSubmit: (values: SignUpInput) => Promise<void>;
  formError?: string;
  defaultEmail?: string;
  submitLabel?: string;
};

export function SignUpForm({ onSubmit, formError, defaultEmail = '', submitLabel }: Props) {
  const { control, handleSubmit, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    defaultValues: { name: '', email: defaultEmail, password: '' },
  });
  const submit = handleSubmit(onSubmit);
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
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
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
