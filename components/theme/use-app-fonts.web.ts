import { Nunito_400Regular } from '@expo-google-fonts/nunito/400Regular';
import { Nunito_600SemiBold } from '@expo-google-fonts/nunito/600SemiBold';
import { Nunito_700Bold } from '@expo-google-fonts/nunito/700Bold';
import { Nunito_800ExtraBold } from '@expo-google-fonts/nunito/800ExtraBold';

/**
 * The font files are referenced here so the export writes them; the page itself preloads them and swaps them in
 * over a metric-matched fallback (scripts/web-fonts.ts writes that into index.html), so nothing waits for them.
 */
export const NUNITO_FILES = [Nunito_400Regular, Nunito_600SemiBold, Nunito_700Bold, Nunito_800ExtraBold];

export function useAppFonts(): boolean {
  return true;
}
