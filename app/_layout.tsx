import { QueryClientProvider } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { BUDGET_FORMAT } from '@/shared/budget-result';
import { Stack } from 'expo-router';
import { useEffect, useEffectEvent, useState } from 'react';
import { LoadingScreen } from '@/components/layout/loading-screen';
import { isPrerenderedSignedOutPage } from '@/components/layout/prerendered-page';
import { colors } from '@/components/theme/tokens';
import { useAppFonts } from '@/components/theme/use-app-fonts';
import { useSession } from '@/stores/auth-client';
import { createQueryClient } from '@/stores/queries/query-client';
import { queryPersister } from '@/stores/queries/persister';
import { resumeKeptSaves, shouldKeepMutation } from '@/stores/queries/offline-queue';
import { STALE } from '@/stores/queries/stale';
import { rememberSignedIn, wasSignedIn } from '@/stores/offline-session';
import { useOnline } from '@/components/offline/use-online';
import packageJson from '@/package.json';
import { hydrateUnits } from '@/stores/units-store';
import '@/shared/schemas/plain-errors';

// Before the first render, so no screen shows metric figures for a moment to a US-units user.
hydrateUnits();

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const fontsReady = useAppFonts();
  const session = useSession();
  const online = useOnline();
  // better-auth reports "pending" again while it refetches after a sign-in from signed out; only the
  // first answer may hold the app, or the navigator is torn down and pages outside the groups (an
  // invite being joined) lose their place.
  // A page prerendered for a signed-out visitor already shows its screen: that is the first frame, with no wait.
  const [sessionKnown, setSessionKnown] = useState(isPrerenderedSignedOutPage);
  if (!session.isPending && !sessionKnown) setSessionKnown(true);
  // Back online, the session answer on hand is the one that failed with no signal: until it is asked again, the
  // device's memory stands (else the app would sign out for a moment and drop the page it was on).
  const [recheck, setRecheck] = useState({ online, pending: false });
  if (recheck.online !== online) setRecheck({ online, pending: online });
  const refetchSession = useEffectEvent(() => session.refetch());
  useEffect(() => {
    if (!recheck.pending) return;
    let live = true;
    void refetchSession().finally(() => {
      if (live) setRecheck((r) => ({ ...r, pending: false }));
    });
    return () => {
      live = false;
    };
  }, [recheck.pending]);
  // Only a definite answer from the server changes what this device remembers.
  useEffect(() => {
    if (sessionKnown && online && !recheck.pending && !session.error) rememberSignedIn(!!session.data);
  }, [sessionKnown, online, recheck.pending, session.error, session.data]);

  // Hold the first paint until the session is known, so nobody sees a flash of the sign-in page while already signed
  // in. Native apps also wait for the fonts; the web page draws with a fallback and swaps Nunito in.
  if (!fontsReady || !sessionKnown) return <LoadingScreen />;

  // With no signal the session check cannot reach the server: whoever was signed in on this device stays in.
  const signedIn = !!session.data || ((!online || recheck.pending || !!session.error) && wasSignedIn());
  const stack = (
    <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.dune } }}>
      <Stack.Protected guard={signedIn}>
        <Stack.Screen name="(app)" />
      </Stack.Protected>
      <Stack.Protected guard={!signedIn}>
        <Stack.Screen name="(auth)" />
      </Stack.Protected>
    </Stack>
  );
  return queryPersister ? (
    <PersistQueryClientProvider
      client={queryClient}
      // A new release starts from a fresh copy: its screens may read the data differently.
      persistOptions={{
        persister: queryPersister,
        maxAge: STALE.DAYS.SEVEN,
        buster: `${packageJson.version}-${BUDGET_FORMAT}`,
        dehydrateOptions: { shouldDehydrateMutation: shouldKeepMutation },
      }}
      // Changes kept on the device before a reload go out now (or, with no signal, as soon as it returns). The
      // device's copy of the data may predate a save made just before a reload (writes to it are throttled) or on
      // another device: it fills the screen at once, and everything restored is then asked for again. With no signal
      // the requests wait and the copy stays on screen.
      onSuccess={() => {
        resumeKeptSaves(queryClient);
        void queryClient.invalidateQueries();
      }}
    >
      {stack}
    </PersistQueryClientProvider>
  ) : (
    <QueryClientProvider client={queryClient}>{stack}</QueryClientProvider>
  );
}
