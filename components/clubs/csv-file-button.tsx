import { Text } from '@/components/ui/text';
import type { CsvFileButtonProps } from './csv-file-button.types';

/** On phones the app has no file picker yet; pasting the list works everywhere. */
export function CsvFileButton({ testID }: CsvFileButtonProps) {
  return (
    <Text testID={testID} variant="caption" color="inkSoft">
      Choosing a CSV file works in the web app; here, paste the list instead.
    </Text>
  );
}
