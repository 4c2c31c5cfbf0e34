/**
 * The Inter weights the theme uses, on the web: WOFF2 files (@fontsource/inter), each weight in
 * its Latin and Latin Extended subsets, declared with CSS @font-face under the family names of
 * components/theme.ts. The browser downloads only the files whose characters a page shows, and
 * shows the system font until they arrive (font-display: swap), so the page never waits for
 * them. The unicode ranges are the subsets' own (as @fontsource/inter declares them).
 */
import { useState } from 'react';
import { fonts } from './theme';

const LATIN =
  'U+0000-00FF,U+0131,U+0152-0153,U+02BB-02BC,U+02C6,U+02DA,U+02DC,U+0304,U+0308,U+0329,U+2000-206F,U+20AC,U+2122,U+2191,U+2193,U+2212,U+2215,U+FEFF,U+FFFD';
const LATIN_EXT =
  'U+0100-02BA,U+02BD-02C5,U+02C7-02CC,U+02CE-02D7,U+02DD-02FF,U+0304,U+0308,U+0329,U+1D00-1DBF,U+1E00-1E9F,U+1EF2-1EFF,U+2020,U+20A0-20AB,U+20AD-20C0,U+2113,U+2C60-2C7F,U+A720-A7FF';

const FACES: { family: string; latin: string; latinExt: string }[] = [
  { family: fonts.regular, latin: require('@fontsource/inter/files/inter-latin-400-normal.woff2'), latinExt: require('@fontsource/inter/files/inter-latin-ext-400-normal.woff2') },
  { family: fonts.medium, latin: require('@fontsource/inter/files/inter-latin-500-normal.woff2'), latinExt: require('@fontsource/inter/files/inter-latin-ext-500-normal.woff2') },
  { family: fonts.semibold, latin: require('@fontsource/inter/files/inter-latin-600-normal.woff2'), latinExt: require('@fontsource/inter/files/inter-latin-ext-600-normal.woff2') },
  { family: fonts.bold, latin: require('@fontsource/inter/files/inter-latin-700-normal.woff2'), latinExt: require('@fontsource/inter/files/inter-latin-ext-700-normal.woff2') },
];

const STYLE_ID = 'ovalyard-fonts';

/** The @font-face rules: two per weight (Latin, Latin Extended). */
export function fontFaceCss(): string {
  const face = (family: string, url: string, range: string) =>
    `@font-face{font-family:'${family}';font-style:normal;font-display:swap;src:url(${JSON.stringify(url)}) format('woff2');unicode-range:${range};}`;
  return FACES.map((f) => face(f.family, f.latinExt, LATIN_EXT) + face(f.family, f.latin, LATIN)).join('\n');
}

function declareFonts(): void {
  if (typeof document === 'undefined' || document.getElementById(STYLE_ID)) return;
  const style = document.createElement('style');
  style.id = STYLE_ID;
  style.textContent = fontFaceCss();
  document.head.appendChild(style);
}

/** Declares the fonts once; ready at once (the text swaps to Inter when a file arrives). */
export function useAppFonts(): [boolean, Error | null] {
  useState(declareFonts);
  return [true, null];
}
