import { useQuery } from '@tanstack/react-query';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { apiFetch } from '@/stores/queries/api-client';
import { STALE } from '@/stores/queries/stale';
import { useOnline } from '@/components/offline/use-online';

/** Polls the health route so a dropped server shows a banner instead of silent failures. */
export function ServerStatusBanner() {
  const health = useQuery({
    queryKey: ['health'],
    queryFn: () => apiFetch<{ status: string }>('/api/health'),
    refetchInterval: STALE.SECONDS.THIRTY,
    retry: false,
  });
  // With no connection at all, the offline banner says so (and how old the data is).
  const online = useOnline();
  if (!health.isError || !online) return null;
  return (
    <View style={styles.wrap}>
      <Banner
        testID="server-down-banner"
        message="Can't reach the Trailtally server. Your changes will not be saved until it is back."
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { padding: space.lg, paddingBottom: 0 } });
