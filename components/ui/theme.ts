/**
 * Tubeloom's visual identity in one module: palette, type scale, spacing, radii and font families.
 * Deep ink-teal base, a warm copper accent (the copper of the tubes), a light warm-neutral background.
 * IBM Plex Sans for text, IBM Plex Mono for numbers (tabular figures). Every screen reads its look from here.
 */
import type { TextStyle } from 'react-native';

export const palette = {
  ink900: '#0E2A33',
  ink800: '#143844',
  ink700: '#1B4753',
  teal600: '#1D6B73',
  teal500: '#25838C',
  teal100: '#DCEFEF',
  copper700: '#8A4516',
  copper600: '#A9561F',
  copper500: '#C06A2C',
  copper100: '#F6E6D8',
  sand50: '#F6F4F0',
  sand100: '#EEEAE3',
  sand200: '#E2DCD2',
  sand300: '#CFC7BA',
  white: '#FFFFFF',
  slate900: '#162227',
  slate600: '#4A5A60',
  slate500: '#5E6E74',
  red700: '#A52A1F',
  red100: '#FBE9E6',
  green700: '#2A6B45',
  green100: '#E3F2E8',
  amber800: '#7A5000',
  amber100: '#FFF3D6',
} as const;

/** Colours by role: components use these names, never the raw palette. */
export const colors = {
  background: palette.sand50,
  surface: palette.white,
  surfaceMuted: palette.sand100,
  surfaceStripe: '#FBFAF7',
  border: palette.sand200,
  borderStrong: palette.sand300,
  text: palette.slate900,
  textMuted: palette.slate600,
  textOnDark: '#F2F6F6',
  textOnDarkMuted: '#A9C2C6',
  primary: palette.teal600,
  primaryPressed: palette.ink700,
  primarySoft: palette.teal100,
  accent: palette.copper600,
  accentStrong: palette.copper700,
  accentSoft: palette.copper100,
  chrome: palette.ink900,
  chromeRaised: palette.ink800,
  danger: palette.red700,
  dangerSoft: palette.red100,
  success: palette.green700,
  successSoft: palette.green100,
  warning: palette.amber800,
  warningSoft: palette.amber100,
  focus: palette.copper500,
} as const;

/** Font family names as registered by useFonts in app/_layout.tsx (one family per weight). */
export const fonts = {
  sans: 'IBMPlexSans_400Regular',
  sansMedium: 'IBMPlexSans_500Medium',
  sansSemiBold: 'IBMPlexSans_600SemiBold',
  mono: 'IBMPlexMono_400Regular',
  monoMedium: 'IBMPlexMono_500Medium',
} as const;

export const space = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

/** Type scale: size / line height pairs with the family that goes with each role. */
export const type = {
  display: { fontFamily: fonts.sansSemiBold, fontSize: 30, lineHeight: 38 },
  title: { fontFamily: fonts.sansSemiBold, fontSize: 22, lineHeight: 30 },
  heading: { fontFamily: fonts.sansSemiBold, fontSize: 18, lineHeight: 26 },
  body: { fontFamily: fonts.sans, fontSize: 16, lineHeight: 24 },
  bodyStrong: { fontFamily: fonts.sansMedium, fontSize: 16, lineHeight: 24 },
  small: { fontFamily: fonts.sans, fontSize: 14, lineHeight: 20 },
  smallStrong: { fontFamily: fonts.sansMedium, fontSize: 14, lineHeight: 20 },
  caption: { fontFamily: fonts.sans, fontSize: 12, lineHeight: 16 },
  label: { fontFamily: fonts.sansMedium, fontSize: 14, lineHeight: 20 },
  number: { fontFamily: fonts.mono, fontSize: 14, lineHeight: 20, fontVariant: ['tabular-nums'] },
  numberLarge: { fontFamily: fonts.monoMedium, fontSize: 20, lineHeight: 28, fontVariant: ['tabular-nums'] },
} as const satisfies Record<string, TextStyle>;

/** Width at and above which the shell switches to the sidebar layout. */
export const WIDE_BREAKPOINT = 1024;
/** Readable content width for forms and text on wide screens. */
export const CONTENT_MAX_WIDTH = 1120;
export const FORM_MAX_WIDTH = 480;
/** Smallest comfortable touch target (common practice: 44 pt). */
export const TOUCH_TARGET = 44;

export const theme = { palette, colors, fonts, space, radius, type } as const;
export type Theme = typeof theme;
