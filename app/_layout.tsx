import { QueryClientProvider } from '@tanstack/react-query';
import { Stack } from 'expo-router';
import { useState } from 'react';
import { LoadingScreen } from '@/components/layout/loading-screen';
import { colors } from '@/components/theme/tokens';
import { useAppFonts } from '@/components/theme/use-app-fonts';
import { useSession } from '@/stores/auth-client';
import { createQueryClient } from '@/stores/queries/query-client';
import { hydrateUnits } from '@/stores/units-store';
import '@/shared/schemas/plain-errors';

// Before the first render, so no screen shows metric figures for a moment to a US-units user.
hydrateUnits();

export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const fontsReady = useAppFonts();
  const session = useSession();
  // better-auth reports "pending" again while it refetches after a sign-in from signed out; only the
  // first answer may hold the app, or the navigator is torn down and pages outside the groups (an
  // invite being joined) lose their place.
  const [sessionKnown, setSessionKnown] = useState(false);
  if (!session.isPending && !sessionKnown) setSessionKnown(true);

  // Hold the first paint until the session is known, so nobody sees a flash of the sign-in page while already signed
  // in. Native apps also wait for the fonts; the web page draws with a fallback and swaps Nunito in.
  if (!fontsReady || !sessionKnown) return <LoadingScreen />;

  const signedIn = !!session.data;
  return (
    <QueryClientProvider client={queryClient}>
      <Stack screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.dune } }}>
        <Stack.Protected guard={signedIn}>
          <Stack.Screen name="(app)" />
        </Stack.Protected>
        <Stack.Protected guard={!signedIn}>
          <Stack.Screen name="(auth)" />
        </Stack.Protected>
      </Stack>
    </QueryClientProvider>
  );
}
