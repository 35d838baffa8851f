/**
 * Opens the browser's file picker and reads the chosen file as text; null when nothing was chosen. The input is
 * kept in the page until then, so browser tests and assistive tools can reach it.
 */
export function pickTextFile(options: {
  accept: string;
  maxBytes: number;
  tooLarge: string;
  testID?: string;
}): Promise<{ name: string; text: string } | { error: string } | null> {
  return new Promise((resolve) => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = options.accept;
    if (options.testID) input.setAttribute('data-testid', options.testID);
    input.style.display = 'none';
    input.addEventListener('change', () => {
      const file = input.files?.[0];
      input.remove();
      if (!file) return resolve(null);
      if (file.size > options.maxBytes) return resolve({ error: options.tooLarge });
      file
        .text()
        .then((text) => resolve({ name: file.name, text }))
        .catch(() => resolve({ error: 'That file could not be read. Choose it again.' }));
    });
    input.addEventListener('cancel', () => {
      input.remove();
      resolve(null);
    });
    document.body.appendChild(input);
    input.click();
  });
}

/** Downloads a file the server sends as an attachment; the page stays where it is. */
export function startDownload(url: string): void {
  const a = document.createElement('a');
  a.href = url;
  a.rel = 'noopener';
  a.setAttribute('download', '');
  document.body.appendChild(a);
  a.click();
  a.remove();
}
