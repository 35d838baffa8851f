/** Native builds have no file picker or download yet; the web app has both (file-transfer.web.ts). */
export async function pickTextFile(_options: {
  accept: string;
  maxBytes: number;
  tooLarge: string;
  testID?: string;
}): Promise<{ name: string; text: string } | { error: string } | null> {
  return { error: 'Choosing a file works in the web app.' };
}

export function startDownload(_url: string): void {
  throw new Error('Downloads are available in the web app.');
}
