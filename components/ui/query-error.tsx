import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { ApiError } from '@/stores/queries/api-client';
import { Banner } from './banner';
import { Button } from './button';

export function QueryError({ error, onRetry, testID }: { error: unknown; onRetry: () => void; testID: string }) {
  const message = error instanceof ApiError ? error.message : 'Something went wrong while loading.';
  return (
    <View style={styles.wrap} testID={testID}>
      <Banner testID={`${testID}-message`} message={message} />
      <Button testID={`${testID}-retry`} label="Try again" tone="secondary" onPress={onRetry} />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.md, alignItems: 'flex-start' } });
