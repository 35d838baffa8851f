import { useQueryClient } from '@tanstack/react-query';
import { Link, useRouter, type Href } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AuthShell } from '@/components/layout/auth-shell';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { authClient, useSession } from '@/stores/auth-client';
import { ApiError } from '@/stores/queries/api-client';
import {
  useInviteAcceptMutation,
  useInvitePreviewQuery,
  type AcceptResult,
  type InviteKind,
} from '@/stores/queries/invites';
import { showToast } from '@/stores/toast-store';
import { INVALID_COPY, STATUS_COPY, whatFor } from './invite-copy';
import { InviteAuthPanel } from './invite-auth-panel';

const destination = (result: AcceptResult): Href =>
  result.kind === 'trip' ? `/trips/${result.tripId}` : `/clubs/${result.clubId}`;

function Refusal({ title, body, testID }: { title: string; body: string; testID: string }) {
  return (
    <View style={styles.gap} testID={testID}>
      <Text variant="title" role="heading" aria-level={2}>
        {title}
      </Text>
      <Text color="inkSoft">{body}</Text>
    </View>
  );
}

/** The page an invite e-mail links to: see what it is for, sign in or create an account, join once. */
export function InviteAcceptScreen({ kind, token }: { kind: InviteKind; token: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const session = useSession();
  const preview = useInvitePreviewQuery(kind, token);
  const accept = useInviteAcceptMutation(kind, token);
  const [joined, setJoined] = useState<AcceptResult>();
  const [signingOut, setSigningOut] = useState(false);
  const joinLabel = kind === 'trip' ? 'Join the trip' : 'Join the club';
  const signedInEmail = session.data?.user.email;

  // Leave only once the app knows about the session, so the signed-in screens let us in.
  useEffect(() => {
    if (joined && signedInEmail) router.replace(destination(joined));
  }, [joined, signedInEmail, router]);

  const join = async () => {
    try {
      const result = await accept.mutateAsync();
      showToast(kind === 'trip' ? 'You joined the trip.' : 'You joined the club.');
      setJoined(result);
    } catch {
      // The refusal is shown below from the mutation's error.
    }
  };
  const signOut = async () => {
    setSigningOut(true);
    await authClient.signOut();
    queryClient.clear();
    accept.reset();
    setSigningOut(false);
  };

  let body;
  if (preview.isPending) body = <Skeleton testID="invite-loading" height={160} />;
  else if (preview.isError)
    body =
      preview.error instanceof ApiError && preview.error.status === 404 ? (
        <Refusal testID="invite-invalid" {...INVALID_COPY} />
      ) : (
        <QueryError testID="invite-error" error={preview.error} onRetry={() => void preview.refetch()} />
      );
  else {
    const invite = preview.data.invite;
    const refusal = accept.error instanceof ApiError ? accept.error : undefined;
    const wrongAccount = !!signedInEmail && signedInEmail.toLowerCase() !== invite.email.toLowerCase();
    body = (
      <View style={styles.gap} testID={`invite-${invite.status}`}>
        <Text>{whatFor(invite)}</Text>
        <Text variant="caption" color="inkSoft">
          Sent to {invite.email}
        </Text>
        {invite.status !== 'valid' ? (
          <Refusal testID="invite-refused" {...STATUS_COPY[invite.status]} />
        ) : (
          <>
            {refusal ? <Banner testID="invite-accept-error" message={refusal.message} /> : null}
            {!signedInEmail ? (
              <InviteAuthPanel email={invite.email} joinLabel={joinLabel} onSignedIn={join} />
            ) : wrongAccount || refusal?.code === 'invite_wrong_account' ? (
              <View style={styles.gap} testID="invite-wrong-account">
                <Text>
                  You are signed in as {signedInEmail}, but this invite is for {invite.email}. Sign out, then sign in or
                  create an account with the invited address.
                </Text>
                <Button
                  testID="invite-sign-out"
                  label="Sign out"
                  tone="secondary"
                  busy={signingOut}
                  onPress={() => void signOut()}
                />
              </View>
            ) : (
              <Button
                testID="invite-join"
                label={joinLabel}
                busy={accept.isPending || !!joined}
                onPress={() => void join()}
              />
            )}
          </>
        )}
      </View>
    );
  }

  return (
    <AuthShell
      testID="invite-screen"
      title={kind === 'trip' ? 'Trip invite' : 'Club invite'}
      subtitle="Trailtally plans whether a rig's stored energy lasts the whole trip."
      footer={
        <Link href="/" replace testID="invite-home" accessibilityLabel="Go to Trailtally's start page">
          <Text variant="label" color="pine">
            Go to Trailtally
          </Text>
        </Link>
      }
    >
      {body}
    </AuthShell>
  );
}

const styles = StyleSheet.create({ gap: { gap: space.md } });
