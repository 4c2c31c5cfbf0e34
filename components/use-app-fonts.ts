import { Inter_400Regular } from '@expo-google-fonts/inter/400Regular';
import { Inter_500Medium } from '@expo-google-fonts/inter/500Medium';
import { Inter_600SemiBold } from '@expo-google-fonts/inter/600SemiBold';
import { Inter_700Bold } from '@expo-google-fonts/inter/700Bold';
import { useFonts } from 'expo-font';

/**
 * The Inter weights the theme uses (components/theme.ts `fonts`), on iOS and Android: the TTF
 * files through expo-font. The web has its own file (use-app-fonts.web.ts, WOFF2).
 * @returns [loaded, error] as expo-font's useFonts
 */
export function useAppFonts(): [boolean, Error | null] {
  // Each weight by its subpath so the others stay out of the bundle.
  return useFonts({ Inter_400Regular, Inter_500Medium, Inter_600SemiBold, Inter_700Bold });
}
