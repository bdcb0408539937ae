// Keyoff's own palette, spacing and type scale. Every screen takes its look from here.
export const colors = {
  night: '#17324A', // brand ground, rail
  nightSoft: '#24496A',
  paper: '#F6F3EC', // page background
  card: '#FFFFFF',
  ink: '#1C2630', // body text
  inkSoft: '#55626F',
  line: '#D9D3C7',
  lamp: '#F4B942', // accent: the key
  lampDeep: '#B9831A',
  // Margin states always come with their word, never colour alone.
  comfortable: '#2F7A57',
  tight: '#8C5C00',
  short: '#B3402E',
  focus: '#2A61B8',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const radius = { sm: 6, md: 10, lg: 16 } as const;

export const fonts = {
  regular: 'Nunito_400Regular',
  bold: 'Nunito_700Bold',
  heavy: 'Nunito_800ExtraBold',
} as const;

export const type = {
  display: { fontFamily: fonts.heavy, fontSize: 32, lineHeight: 38 },
  title: { fontFamily: fonts.bold, fontSize: 22, lineHeight: 28 },
  heading: { fontFamily: fonts.bold, fontSize: 17, lineHeight: 22 },
  body: { fontFamily: fonts.regular, fontSize: 15, lineHeight: 22 },
  small: { fontFamily: fonts.regular, fontSize: 13, lineHeight: 18 },
  figure: { fontFamily: fonts.heavy, fontSize: 40, lineHeight: 44 },
} as const;

/** The least height of anything pressed: 44 px (WCAG 2.5.5), by padding or minHeight, never a bigger font. */
export const TAP_MIN = 44;
/** A text link on its own line: a 44 px target, its text centred in it, no wider than the text. */
export const linkTarget = { minHeight: TAP_MIN, display: 'flex', alignItems: 'center', alignSelf: 'flex-start' } as const;
/** A Pressable holding a text link or text button: the same 44 px target. */
export const pressTarget = { minHeight: TAP_MIN, justifyContent: 'center', alignSelf: 'flex-start' } as const;

/** Width from which the app shows a side rail and two columns. */
export const WIDE_BREAKPOINT = 900;
