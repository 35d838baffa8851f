import { Link } from 'expo-router';
import { Text } from '@/components/ui/text';
import { useOutboxAvailableQuery } from '@/stores/queries/outbox';

/**
 * A link to the development Outbox, shown only where this server keeps one and answers this browser (a development
 * server, opened on the machine it runs on). The exported web app is always a production build, so the server's
 * answer decides, not a build-time flag.
 */
export function OutboxLink({ testID, centered = false }: { testID: string; centered?: boolean }) {
  const available = useOutboxAvailableQuery();
  if (available.data !== true) return null;
  return (
    <Link href="/outbox" testID={testID} accessibilityLabel="Open the development Outbox">
      <Text variant="label" color="pine" style={centered ? { textAlign: 'center' } : undefined}>
        Development Outbox: mail this server has kept
      </Text>
    </Link>
  );
}
