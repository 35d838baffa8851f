import { Link } from 'expo-router';
import { useState } from 'react';
import { describeAuthError } from '@/components/forms/auth-error';
import { SignInForm } from '@/components/forms/sign-in-form';
import { AuthShell } from '@/components/layout/auth-shell';
import { OutboxLink } from '@/components/outbox/outbox-link';
import { Text } from '@/components/ui/text';
import { authClient } from '@/stores/auth-client';
import type { SignInInput } from '@/shared/schemas/account';

export default function SignInScreen() {
  const [formError, setFormError] = useState<string>();
  const onSubmit = async (values: SignInInput) => {
    setFormError(undefined);
    try {
      const { error } = await authClient.signIn.email(values);
      if (error) setFormError(describeAuthError(error));
    } catch {
      setFormError(describeAuthError({}));
    }
  };
  return (
    <AuthShell
      testID="sign-in-screen"
      title="Sign in"
      subtitle="Check whether your batteries last the whole trip."
      footer={
        <>
          <Link href="/sign-up" testID="go-to-sign-up" accessibilityLabel="Create an account">
            <Text variant="label" color="pine">
              New here? Create an account
            </Text>
          </Link>
          <Link href="/forgot-password" testID="go-to-forgot-password" accessibilityLabel="Forgot your password?">
            <Text variant="label" color="pine">
              Forgot your password?
            </Text>
          </Link>
          <OutboxLink testID="sign-in-outbox" centered />
        </>
      }
    >
      <SignInForm onSubmit={onSubmit} formError={formError} />
    </AuthShell>
  );
}
