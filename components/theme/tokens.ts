import { face } from './font-face';

// Trailtally's design tokens. Colours are the product palette; read them from here, never inline.
export const colors = {
  ink: '#14213D',
  dune: '#FCF6EC',
  pine: '#2D6A4F',
  ember: '#D9622B',
  sunlit: '#F2B134',
  mist: '#8D99AE',
  lake: '#3E7CB1',
  white: '#FFFFFF',
  // Tints derived from the palette for surfaces and borders.
  card: '#FFFDF8',
  line: '#E6DDCC',
  pineSoft: '#E3EFE8',
  emberSoft: '#FBE6DB',
  inkSoft: '#4A5568',
  // Darker shades of ember and lake for text and small labels: the palette shades fall short of the
  // 4.5:1 contrast that small text needs on dune and white.
  emberInk: '#A8431A',
  lakeInk: '#2C5F8C',
  infoSoft: '#E4EEF7',
  sunlitSoft: '#FDF1D6',
} as const;

export type ColorName = keyof typeof colors;

export const fonts = {
  regular: face('Nunito_400Regular'),
  semiBold: face('Nunito_600SemiBold'),
  bold: face('Nunito_700Bold'),
  extraBold: face('Nunito_800ExtraBold'),
};

/** Spacing scale in px; components pick steps from it instead of ad-hoc numbers. */
export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radii = { sm: 8, md: 14, lg: 20, pill: 999 } as const;

/** Type scale: numbers are shown big and their units small. */
export const typeScale = {
  caption: { fontSize: 13, lineHeight: 18, fontFamily: fonts.semiBold },
  body: { fontSize: 16, lineHeight: 24, fontFamily: fonts.regular },
  label: { fontSize: 15, lineHeight: 20, fontFamily: fonts.bold },
  title: { fontSize: 22, lineHeight: 28, fontFamily: fonts.extraBold },
  display: { fontSize: 32, lineHeight: 38, fontFamily: fonts.extraBold },
  figure: { fontSize: 28, lineHeight: 32, fontFamily: fonts.extraBold },
  unit: { fontSize: 14, lineHeight: 18, fontFamily: fonts.bold },
} as const;

export type TypeVariant = keyof typeof typeScale;

export const shadow = {
  card: { shadowColor: colors.ink, shadowOpacity: 0.06, shadowRadius: 12, shadowOffset: { width: 0, height: 4 } },
} as const;
