// Text as a search compares it: accents folded, case ignored, punctuation as spaces, so "Saint-Étienne",
// "saint etienne" and "ST ETIENNE" meet. Letters that Unicode does not decompose (ø, ß, ł…) are spelled
// the way they are usually written without accents.

const SPELLED: Record<string, string> = {
  ß: 'ss',
  æ: 'ae',
  œ: 'oe',
  ø: 'o',
  đ: 'd',
  ð: 'd',
  þ: 'th',
  ł: 'l',
  ı: 'i',
  ħ: 'h',
};
const SPELLED_PATTERN = new RegExp(`[${Object.keys(SPELLED).join('')}]`, 'g');

export function foldText(text: string): string {
  return (
    text
      .normalize('NFKD')
      .replace(/\p{M}+/gu, '')
      .toLowerCase()
      .replace(SPELLED_PATTERN, (letter) => SPELLED[letter] ?? letter)
      // An apostrophe joins ("St John's" → "st johns"); other punctuation separates words.
      .replace(/['’‘`]/g, '')
      .replace(/[^\p{L}\p{N}]+/gu, ' ')
      .trim()
  );
}
