/**
 * Ovalyard's look: a deep green-slate ink on warm paper, with a copper accent. Every colour,
 * size and font the app uses comes from here.
 */
export const colors = {
  ink: '#1E3336', // primary: deep green-slate (header, primary buttons)
  inkSoft: '#2F4A4E',
  paper: '#F4F1EA', // page background
  surface: '#FFFFFF', // cards, inputs
  surfaceSunk: '#EBE6DB',
  text: '#18292B',
  textMuted: '#5C6B6C',
  textOnInk: '#F4F1EA',
  border: '#D8D2C4',
  accent: '#C0703A', // warm copper: focus, the active tab, small highlights
  accentSoft: '#F3E2D3',
  danger: '#A8322A',
  dangerSoft: '#F7E1DE',
  success: '#2E6B4E',
  successSoft: '#DDEDE3',
  caution: '#8A5A12',
  cautionSoft: '#F6EBD2',
} as const;

/** Inter weights loaded in app/_layout.tsx; use these names as fontFamily (not fontWeight). */
export const fonts = {
  regular: 'Inter_400Regular',
  medium: 'Inter_500Medium',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const radius = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

export const layout = {
  /** Content never grows wider than this; it is centred on wide screens. */
  maxContentWidthPx: 960,
  /** From this window width on, lists may show two columns. */
  twoColumnFromPx: 760,
  /** Smallest touch target (WCAG 2.5.5 suggests 44 × 44 CSS px). */
  minTouchPx: 44,
} as const;

export const type = {
  title: { fontFamily: fonts.bold, fontSize: 24, lineHeight: 30 },
  heading: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24 },
  body: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 22 },
  bodyStrong: { fontFamily: fonts.semibold, fontSize: 16, lineHeight: 22 },
  label: { fontFamily: fonts.medium, fontSize: 14, lineHeight: 18 },
  caption: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18 },
} as const;
