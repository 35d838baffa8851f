import { useState } from 'react';
import { Button } from '@/components/ui/button';
import type { CsvFileButtonProps } from './csv-file-button.types';

// Big club lists stay well under the API's 50 000-character limit at this size.
const MAX_BYTES = 48_000;

/** On the web a plain file input, made on demand, reads the chosen CSV as text. */
export function CsvFileButton({ onLoaded, onError, disabled, testID }: CsvFileButtonProps) {
  const [reading, setReading] = useState(false);
  const choose = () => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = '.csv,text/csv';
    input.setAttribute('data-testid', `${testID}-input`);
    input.style.display = 'none';
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      input.remove();
      if (!file) return;
      if (file.size > MAX_BYTES)
        return onError('That file is too large: split it into lists of a few hundred households.');
      setReading(true);
      file
        .text()
        .then((text) => onLoaded({ name: file.name, text }))
        .catch(() => onError('That file could not be read. Save it as CSV (name,email) and try again.'))
        .finally(() => setReading(false));
    });
    // Kept in the page until chosen so tests and assistive tools can reach it.
    document.body.appendChild(input);
    input.click();
  };
  return (
    <Button
      testID={testID}
      label="Choose a CSV file"
      tone="secondary"
      busy={reading}
      disabled={disabled}
      onPress={choose}
    />
  );
}
