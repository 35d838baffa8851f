import { Link, type Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, fonts, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { OutboxMessage } from '@/stores/queries/outbox';
import { linkTarget } from './link-target';

function target(url: string): Href {
  return (typeof window === 'undefined' ? url : linkTarget(url, window.location.origin)) as Href;
}

export function MessageView({ message, onClose }: { message: OutboxMessage; onClose: () => void }) {
  return (
    <Card testID="outbox-reader">
      <Button testID="outbox-reader-close" label="‹ All messages" tone="quiet" style={styles.close} onPress={onClose} />
      <Text variant="title" role="heading" aria-level={2}>
        {message.subject || '(no subject)'}
      </Text>
      <Text variant="caption" color="inkSoft">
        From {message.from} · to {message.to.join(', ')} · {new Date(message.receivedAt).toLocaleString('en-GB')}
      </Text>
      {message.links.length > 0 ? (
        <View style={styles.links} testID="outbox-links">
          <Text variant="label">Links</Text>
          {message.links.map((url, i) => (
            <Link
              key={url}
              href={target(url)}
              testID={`outbox-link-${i}`}
              accessibilityLabel={`Follow link ${i + 1}: ${url}`}
              style={styles.link}
            >
              <Text variant="label" color="lake" style={styles.url}>
                {url}
              </Text>
            </Link>
          ))}
        </View>
      ) : null}
      <Text testID="outbox-text" style={styles.text}>
        {message.text}
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  close: { alignSelf: 'flex-start', paddingHorizontal: 0 },
  links: {
    gap: space.xs,
    padding: space.md,
    borderRadius: radii.md,
    backgroundColor: colors.dune,
    borderWidth: 1,
    borderColor: colors.line,
  },
  link: { paddingVertical: space.xs },
  url: { textDecorationLine: 'underline' },
  text: { fontFamily: fonts.regular },
});
