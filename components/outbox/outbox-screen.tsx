import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/stores/queries/api-client';
import { useOutboxQuery, type OutboxMessage } from '@/stores/queries/outbox';
import { MessageView } from './message-view';

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'medium' });

function MessageRow({ message, selected, onOpen }: { message: OutboxMessage; selected: boolean; onOpen: () => void }) {
  const to = message.to.join(', ');
  return (
    <Pressable
      testID={`outbox-message-${message.id}`}
      accessibilityRole="button"
      accessibilityLabel={`Open “${message.subject}” to ${to}`}
      aria-pressed={selected}
      onPress={onOpen}
      style={[styles.row, selected ? styles.rowOn : null]}
    >
      <Text variant="label" numberOfLines={2}>
        {message.subject || '(no subject)'}
      </Text>
      <Text variant="caption" color="inkSoft" numberOfLines={1}>
        To {to}
      </Text>
      <Text variant="caption" color="inkSoft">
        {when(message.receivedAt)}
      </Text>
    </Pressable>
  );
}

/** Development only: the e-mails the local mail fake caught, newest first, with their links. */
export function OutboxScreen() {
  const wide = useIsWide();
  const outbox = useOutboxQuery();
  const [openId, setOpenId] = useState<string>();
  const messages = outbox.data?.messages ?? [];
  const open = messages.find((m) => m.id === openId);

  let content;
  if (outbox.isPending) content = <Skeleton testID="outbox-loading" height={200} />;
  else if (outbox.isError)
    content =
      outbox.error instanceof ApiError && outbox.error.status === 404 ? (
        <EmptyState
          testID="outbox-unavailable"
          title="The outbox exists only in development"
          body="This server sends real e-mail, so there is nothing to show here."
        />
      ) : (
        <QueryError testID="outbox-error" error={outbox.error} onRetry={() => void outbox.refetch()} />
      );
  else if (messages.length === 0)
    content = (
      <EmptyState
        testID="outbox-empty"
        title="No e-mail yet"
        body="Invite someone from a trip's People tab or a club, or create an account: the messages appear here."
      />
    );
  else {
    const list = (
      <Card testID="outbox-list" style={wide ? styles.listWide : null}>
        {messages.map((m) => (
          <MessageRow key={m.id} message={m} selected={m.id === openId} onOpen={() => setOpenId(m.id)} />
        ))}
      </Card>
    );
    const reader = open ? <MessageView message={open} onClose={() => setOpenId(undefined)} /> : null;
    content = wide ? (
      <View style={styles.panes}>
        {list}
        <View style={styles.reader}>{reader ?? <Text color="inkSoft">Choose a message to read it.</Text>}</View>
      </View>
    ) : (
      (reader ?? list)
    );
  }

  return (
    <ScrollView testID="outbox-screen" style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.inner}>
        <Link href="/" replace testID="outbox-home" accessibilityLabel="Back to Trailtally" style={styles.back}>
          <Text variant="label" color="pine">
            ‹ Trailtally
          </Text>
        </Link>
        <Text variant="display" role="heading" aria-level={1}>
          Outbox
        </Text>
        <Text color="inkSoft">Mail caught by the local mail fake in development. Nothing here left this machine.</Text>
        {content}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.dune },
  content: { padding: space.lg, paddingBottom: space.xxxl },
  inner: { width: '100%', maxWidth: 1200, alignSelf: 'center', gap: space.lg },
  back: { minHeight: 44, paddingVertical: space.sm },
  panes: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  listWide: { width: 420 },
  reader: { flex: 1, minWidth: 0 },
  row: { paddingVertical: space.sm, paddingHorizontal: space.sm, borderRadius: radii.md, gap: 2 },
  rowOn: { backgroundColor: colors.pineSoft },
});
