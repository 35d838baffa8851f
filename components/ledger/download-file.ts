/** Native builds would hand the file to the share sheet; the product ships on the web first. */
export function downloadFile(_name: string, _text: string, _type = 'text/csv'): void {
  throw new Error('Downloads are available in the web app.');
}
