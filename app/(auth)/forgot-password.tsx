import { Link } from 'expo-router';
import { ForgotPasswordForm } from '@/components/forms/forgot-password-form';
import { AuthShell } from '@/components/layout/auth-shell';
import { Text } from '@/components/ui/text';

export default function ForgotPasswordScreen() {
  return (
    <AuthShell
      testID="forgot-screen"
      title="Forgot your password?"
      subtitle="We will e-mail you a link to choose a new one."
      footer={
        <Link href="/sign-in" dismissTo testID="forgot-back" accessibilityLabel="Back to sign in">
          <Text variant="label" color="pine">
            Back to sign in
          </Text>
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthShell>
  );
}
