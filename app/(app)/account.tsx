import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { NameCard, PasswordCard, UnitsCard } from '@/components/forms/account-forms';
import { OutboxLink } from '@/components/outbox/outbox-link';
import { Banner } from '@/components/ui/banner';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { authClient, useSession } from '@/stores/auth-client';
import { NETWORK_MESSAGE } from '@/stores/queries/api-client';

export default function AccountScreen() {
  const session = useSession();
  const queryClient = useQueryClient();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();
  const signOut = async () => {
    setBusy(true);
    setError(undefined);
    try {
      const result = await authClient.signOut();
      if (result.error) throw new Error(result.error.message);
      queryClient.clear();
    } catch {
      setError(NETWORK_MESSAGE);
      setBusy(false);
    }
  };
  return (
    <Screen testID="account-screen" title="Account">
      <Card>
        <Text variant="title">{session.data?.user.name}</Text>
        <Text color="inkSoft">{session.data?.user.email}</Text>
      </Card>
      <UnitsCard />
      {session.data ? <NameCard name={session.data.user.name} /> : null}
      <PasswordCard owner={session.data?.user} />
      <OutboxLink testID="account-outbox" />
      {error ? <Banner testID="sign-out-error" message={error} /> : null}
      <Button testID="sign-out" label="Sign out" tone="secondary" busy={busy} onPress={signOut} />
    </Screen>
  );
}
