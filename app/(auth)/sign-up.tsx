import { Link } from 'expo-router';
import { useState } from 'react';
import { describeAuthError } from '@/components/forms/auth-error';
import { SignUpForm } from '@/components/forms/sign-up-form';
import { AuthShell } from '@/components/layout/auth-shell';
import { Text } from '@/components/ui/text';
import { authClient } from '@/stores/auth-client';
import type { SignUpInput } from '@/shared/schemas/account';

export default function SignUpScreen() {
  const [formError, setFormError] = useState<string>();
  const onSubmit = async (values: SignUpInput) => {
    setFormError(undefined);
    try {
      const { error } = await authClient.signUp.email(values);
      if (error) setFormError(describeAuthError(error));
    } catch {
      setFormError(describeAuthError({}));
    }
  };
  return (
    <AuthShell
      testID="sign-up-screen"
      title="Create account"
      subtitle="Plan trips, rigs and routines, and share them with your crew."
      footer={
        <Link href="/sign-in" testID="go-to-sign-in" accessibilityLabel="Sign in instead">
          <Text variant="label" color="pine">
            Already have an account? Sign in
          </Text>
        </Link>
      }
    >
      <SignUpForm onSubmit={onSubmit} formError={formError} />
    </AuthShell>
  );
}
