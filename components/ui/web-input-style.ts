// The browser's own inputs (time, date, date and time) drawn as DOM elements: a plain style object that matches
// TextField's box, and the read-only look that matches TextField's plain text.
import { colors, fonts, radii, space } from '@/components/theme/tokens';

export const webInputStyle = {
  minHeight: 48,
  boxSizing: 'border-box',
  width: '100%',
  minWidth: 0,
  borderWidth: 2,
  borderStyle: 'solid',
  borderColor: colors.line,
  borderRadius: radii.md,
  padding: `0 ${space.md}px`,
  backgroundColor: colors.white,
  color: colors.ink,
  fontFamily: fonts.regular,
  fontSize: 16,
} as const;

// Read-only reads as plain text: no box and no picker button.
export const webReadOnlyStyle = {
  minHeight: 28,
  borderWidth: 0,
  padding: 0,
  backgroundColor: 'transparent',
  fontFamily: fonts.semiBold,
  appearance: 'none',
} as const;
