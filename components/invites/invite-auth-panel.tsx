import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeAuthError } from '@/components/forms/auth-error';
import { SignInForm } from '@/components/forms/sign-in-form';
import { SignUpForm } from '@/components/forms/sign-up-form';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { ChoiceChips } from '@/components/ui/choice-chips';
import type { SignInInput, SignUpInput } from '@/shared/schemas/account';
import { authClient } from '@/stores/auth-client';

type Mode = 'sign-up' | 'sign-in';

type Props = {
  email: string;
  joinLabel: string;
  /** Runs once a session exists; the invite is joined from there. */
  onSignedIn: () => Promise<void>;
};

/** Signed out on an invite: create an account or sign in right here, with the invited address filled in. */
export function InviteAuthPanel({ email, joinLabel, onSignedIn }: Props) {
  const [mode, setMode] = useState<Mode>('sign-up');
  const [formError, setFormError] = useState<string>();
  const [checkMail, setCheckMail] = useState(false);

  const signIn = async (values: SignInInput) => {
    setFormError(undefined);
    try {
      const { error } = await authClient.signIn.email(values);
      if (error) return setFormError(describeAuthError(error));
      await onSignedIn();
    } catch {
      setFormError(describeAuthError({}));
    }
  };
  const signUp = async (values: SignUpInput) => {
    setFormError(undefined);
    try {
      const { data, error } = await authClient.signUp.email(values);
      if (error) return setFormError(describeAuthError(error));
      // Where sign-in waits for a confirmed address, there is no session yet: the e-mail comes first.
      if (!data?.token) return setCheckMail(true);
      await onSignedIn();
    } catch {
      setFormError(describeAuthError({}));
    }
  };

  if (checkMail)
    return (
      <Banner
        testID="invite-check-mail"
        tone="info"
        message={`We sent a confirmation e-mail to ${email}. Open its link, then come back to this invite and sign in to join.`}
      />
    );
  return (
    <View style={styles.wrap} testID="invite-auth">
      <ChoiceChips
        testID="invite-auth-mode"
        label="Do you have a Trailtally account?"
        options={[
          { value: 'sign-up', label: 'No, create one' },
          { value: 'sign-in', label: 'Yes, sign in' },
        ]}
        value={mode}
        onChange={(next) => {
          setFormError(undefined);
          setMode(next);
        }}
      />
      {mode === 'sign-up' ? (
        <SignUpForm
          key="up"
          onSubmit={signUp}
          formError={formError}
          defaultEmail={email}
          submitLabel={`Create account and ${joinLabel.toLowerCase()}`}
        />
      ) : (
        <SignInForm
          key="in"
          onSubmit={signIn}
          formError={formError}
          defaultEmail={email}
          submitLabel={`Sign in and ${joinLabel.toLowerCase()}`}
        />
      )}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });
