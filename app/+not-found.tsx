import { Link } from 'expo-router';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

export default function NotFoundScreen() {
  return (
    <Screen testID="not-found-screen" title="Nothing here" subtitle="That page does not exist or has moved.">
      <Link href="/" testID="not-found-home" accessibilityLabel="Go to your trips">
        <Text variant="label" color="pine">
          Go to your trips
        </Text>
      </Link>
    </Screen>
  );
}
