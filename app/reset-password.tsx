import { Link, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { ResetPasswordForm } from '@/components/forms/reset-password-form';
import { AuthShell } from '@/components/layout/auth-shell';
import { Banner } from '@/components/ui/banner';
import { Text } from '@/components/ui/text';

// Outside both groups: the e-mail link must open whether or not someone is signed in on this browser.
export default function ResetPasswordScreen() {
  const { token, error } = useLocalSearchParams<{ token?: string; error?: string }>();
  const [done, setDone] = useState(false);
  let body;
  if (done)
    body = <Banner testID="reset-done" tone="info" message="Your password is changed. Sign in with the new one." />;
  else if (!token || error)
    body = (
      <Banner
        testID="reset-invalid"
        message="This reset link has expired or is incomplete. Ask for a new one from the sign-in page."
      />
    );
  else body = <ResetPasswordForm token={token} onDone={() => setDone(true)} />;
  return (
    <AuthShell
      testID="reset-screen"
      title="Choose a new password"
      subtitle="Reset links work once, for one hour."
      footer={
        <Link href="/sign-in" replace testID="reset-to-sign-in" accessibilityLabel="Go to sign in">
          <Text variant="label" color="pine">
            Go to sign in
          </Text>
        </Link>
      }
    >
      {body}
    </AuthShell>
  );
}
